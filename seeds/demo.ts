import type { Knex } from 'knex';

import type { Role } from '@/modules/accounts/core/roles';
import type { PianoKind, Stage } from '@/modules/pianos/core/piano';

// An invented dealer, Larkspur Lane Pianos, with invented staff, makers and stock. Demo data only.
export const DEMO_PASSWORD = 'feltwire-demo';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'intake@feltwire.test', name: 'Ines Okafor-Lind', role: 'intake' },
  { email: 'tech@feltwire.test', name: 'Tomas Reyval', role: 'technician' },
  { email: 'floor@feltwire.test', name: 'Fern Adeyemi-Holt', role: 'floor' },
  { email: 'manager@feltwire.test', name: 'Mara Quillfeather', role: 'manager' },
];

interface DemoPiano {
  maker: string;
  model: string;
  serialNumber: string;
  year: number;
  yearIsEstimate: boolean;
  kind: PianoKind;
  sizeCm: number;
  finish: string;
  stage: Stage;
}

export const DEMO_PIANOS: DemoPiano[] = [
  { maker: 'Almsbury', model: 'Parlour 118', serialNumber: 'AL-204117', year: 1987, yearIsEstimate: false, kind: 'upright', sizeCm: 118, finish: 'satin walnut', stage: 'received' },
  { maker: 'Thornquist & Hale', model: 'Studio B', serialNumber: 'TH-88213', year: 1972, yearIsEstimate: true, kind: 'upright', sizeCm: 126, finish: 'polished ebony', stage: 'received' },
  { maker: 'Corvelle', model: 'G-172', serialNumber: 'CV-530981', year: 2004, yearIsEstimate: false, kind: 'grand', sizeCm: 172, finish: 'polished ebony', stage: 'assessed' },
  { maker: 'Marrowfield', model: 'Console 109', serialNumber: 'MF-11902', year: 1995, yearIsEstimate: false, kind: 'upright', sizeCm: 109, finish: 'cherry', stage: 'assessed' },
  { maker: 'Wendell Kestrel', model: 'Salon', serialNumber: 'WK-7731', year: 1958, yearIsEstimate: true, kind: 'grand', sizeCm: 155, finish: 'mahogany', stage: 'in_workshop' },
  { maker: 'Almsbury', model: 'Parlour 121', serialNumber: 'AL-310552', year: 2011, yearIsEstimate: false, kind: 'upright', sizeCm: 121, finish: 'white satin', stage: 'in_workshop' },
  { maker: 'Solenne', model: 'Model 5', serialNumber: 'SO-19044', year: 1999, yearIsEstimate: false, kind: 'upright', sizeCm: 131, finish: 'polished ebony', stage: 'ready' },
  { maker: 'Corvelle', model: 'U-125', serialNumber: 'CV-402277', year: 2008, yearIsEstimate: false, kind: 'upright', sizeCm: 125, finish: 'satin oak', stage: 'on_floor' },
  { maker: 'Thornquist & Hale', model: 'Concert Parlour', serialNumber: 'TH-90077', year: 1983, yearIsEstimate: false, kind: 'grand', sizeCm: 188, finish: 'polished ebony', stage: 'on_floor' },
  { maker: 'Marrowfield', model: 'Spinet 91', serialNumber: 'MF-06650', year: 1979, yearIsEstimate: true, kind: 'upright', sizeCm: 91, finish: 'walnut', stage: 'on_floor' },
  { maker: 'Solenne', model: 'Model 3', serialNumber: 'SO-15520', year: 1992, yearIsEstimate: false, kind: 'upright', sizeCm: 121, finish: 'mahogany', stage: 'held' },
  { maker: 'Wendell Kestrel', model: 'Boudoir', serialNumber: 'WK-8102', year: 1964, yearIsEstimate: true, kind: 'grand', sizeCm: 150, finish: 'satin black', stage: 'sold' },
];

/** Adds the demo users and pianos that are not there yet; running it twice changes nothing. */
export async function seedDemo(knex: Knex, hash: (password: string) => Promise<string>): Promise<{ users: number; pianos: number }> {
  const passwordHash = await hash(DEMO_PASSWORD);
  const users = await knex('users')
    .insert(DEMO_USERS.map((u) => ({ ...u, password_hash: passwordHash })))
    .onConflict('email')
    .ignore()
    .returning('id');
  const intake = await knex('users').where({ email: 'intake@feltwire.test' }).first('id');
  let pianos = 0;
  for (const p of DEMO_PIANOS) {
    const exists = await knex('pianos').where({ serial_number: p.serialNumber, maker: p.maker }).first('id');
    if (exists) continue;
    await knex('pianos').insert({
      maker: p.maker,
      model: p.model,
      serial_number: p.serialNumber,
      year: p.year,
      year_is_estimate: p.yearIsEstimate,
      kind: p.kind,
      size_cm: p.sizeCm,
      finish: p.finish,
      stage: p.stage,
      created_by_id: intake?.id ?? null,
    });
    pianos += 1;
  }
  return { users: users.length, pianos };
}
