import { useEffect } from 'react';

import { formatDay } from '@/modules/pianos/ui/piano-format';
import { Button } from '@/modules/theme/ui/button';
import { Checkbox } from '@/modules/theme/ui/checkbox';
import { Notice } from '@/modules/theme/ui/notice';

import type { AssessmentDraft } from '../intake-draft';
import { useSamePianos } from '../use-same-pianos';
import type { DraftUpdate } from './step-props';

interface SamePianoNoticeProps {
  draft: AssessmentDraft;
  update: DraftUpdate;
  /** the server's refusal, when it named this */
  error?: string;
}

/**
 * The same maker, model and serial already on record: said before submit, with the way to the earlier
 * record. A piano coming back is taken in again only once intake staff say it is the same one.
 */
export function SamePianoNotice({ draft, update, error }: SamePianoNoticeProps) {
  const p = draft.piano;
  const matches = useSamePianos(p.maker, p.model, p.serialNumber, draft.pianoId);
  const confirmed = draft.samePianoAs;
  // A confirmation for a record that no longer matches what is typed does not stand.
  useEffect(() => {
    if (matches && confirmed != null && !matches.some((m) => m.id === confirmed)) update((d) => ({ ...d, samePianoAs: null }));
  }, [matches, confirmed, update]);
  if (!matches?.length) return null;
  const names = matches.map((m) => `${m.stockNumber} (taken in ${formatDay(m.createdAt)})`).join(', ');
  return (
    <Notice
      tone={error && confirmed == null ? 'error' : 'caution'}
      title="Taken in before?"
      testID="same-piano"
      actions={
        <>
          {matches.map((m) => (
            <Button key={m.id} label={`Open ${m.stockNumber}`} variant="secondary" href={`/pianos/${m.id}`} testID={`same-piano-open-${m.stockNumber}`} />
          ))}
          {matches.map((m) => (
            <Checkbox
              key={`c${m.id}`}
              label={`This is ${m.stockNumber} coming back: take it in again`}
              checked={confirmed === m.id}
              onChange={(on) => update((d) => ({ ...d, samePianoAs: on ? m.id : null }))}
              testID={`same-piano-confirm-${m.stockNumber}`}
            />
          ))}
        </>
      }
    >
      {`${names} ${matches.length === 1 ? 'has' : 'have'} the same maker, model and serial number. If it is the same piano coming back, say so below; otherwise check the serial number.${confirmed != null ? ' Confirmed: it is taken in again, linked to the earlier record.' : ''}`}
    </Notice>
  );
}
