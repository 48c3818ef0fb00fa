import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem, problemWithoutField } from '@/modules/accounts/ui/graph-error';
import { formatDayTime, isLocale, isTimeZone } from '@/modules/shop/core/dealer-time';
import { contactLines, shopProfileInput, type ShopProfile } from '@/modules/shop/core/shop-profile';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { useSaveShopProfile, useShopProfile } from './use-shop-profile';

type Draft = Omit<ShopProfile, 'workshopIdleDays'> & { workshopIdleDays: string };
type Field = keyof ShopProfile;

const toDraft = (p: ShopProfile): Draft => ({ ...p, workshopIdleDays: String(p.workshopIdleDays) });
// A fixed moment to show how dates will read: 3 December 2026, 14:05 UTC.
const SAMPLE_TIME = '2026-12-03T14:05:00.000Z';

/** The manager's form for the shop's details: the letterhead on the papers, where dates are written, the idle rule. */
export function ShopProfileSection() {
  const { profile, error, refresh } = useShopProfile();
  const problem = graphProblem(error);
  return (
    <View role="region" aria-label="Shop details" style={styles.section} testID="shop-profile">
      <Heading level={2}>Shop details</Heading>
      <Body tone="secondary">The address and contact printed on the signed copy and the printable page, and the language and time zone every date a buyer reads is written in.</Body>
      {profile ? <ShopProfileEditor profile={profile} onSaved={refresh} /> : problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the shop details…" />}
    </View>
  );
}

function ShopProfileEditor({ profile, onSaved }: { profile: ShopProfile; onSaved: () => void }) {
  const save = useSaveShopProfile();
  const wide = useWide();
  const [draft, setDraft] = useState<Draft>(() => toDraft(profile));
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [feedback, setFeedback] = useState<{ tone: 'error' | 'success'; text: string } | null>(null);
  const set = (key: Field, value: string) => {
    setDraft((d) => ({ ...d, [key]: value }));
    setErrors((e) => ({ ...e, [key]: undefined }));
  };
  const days = /^\d{1,3}$/.test(draft.workshopIdleDays.trim()) ? Number(draft.workshopIdleDays.trim()) : Number.NaN;
  const sample = isLocale(draft.locale.trim()) && isTimeZone(draft.timeZone.trim()) ? formatDayTime(SAMPLE_TIME, { locale: draft.locale.trim(), timeZone: draft.timeZone.trim() }) : null;

  const submit = async () => {
    setFeedback(null);
    const parsed = shopProfileInput.safeParse({ ...draft, workshopIdleDays: days });
    if (!parsed.success) {
      const found: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) found[issue.path[0] as Field] ??= capital(issue.message);
      if (Number.isNaN(days)) found.workshopIdleDays = 'A whole number of days, 1-365.';
      setErrors(found);
      setFeedback({ tone: 'error', text: 'Some details need fixing: see the fields marked in red.' });
      return;
    }
    const outcome = await save.run({ input: parsed.data });
    if (!outcome.ok) {
      const field = outcome.problem.field as Field | undefined;
      if (field && field in draft) setErrors({ [field]: capital(problemWithoutField(outcome.problem)) });
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setDraft(toDraft(outcome.data));
    setFeedback({ tone: 'success', text: 'Saved. Papers made from now on carry these details.' });
    onSaved();
  };

  const lines = contactLines({ address: draft.address, phone: draft.phone.trim(), email: draft.email.trim(), website: draft.website.trim() });
  return (
    <>
      <Card role="form" accessibilityLabel="Shop details">
        <TextField label="Address" hint="As it should read on the papers; one line or several." value={draft.address} onChangeText={(v) => set('address', v)} multiline maxLength={300} error={errors.address} testID="profile-address" />
        <View style={[styles.pair, wide && styles.pairWide]}>
          <View style={styles.half}>
            <TextField label="Telephone" value={draft.phone} onChangeText={(v) => set('phone', v)} keyboardType="phone-pad" maxLength={40} error={errors.phone} testID="profile-phone" />
          </View>
          <View style={styles.half}>
            <TextField label="E-mail" value={draft.email} onChangeText={(v) => set('email', v)} keyboardType="email-address" autoCapitalize="none" maxLength={254} error={errors.email} testID="profile-email" />
          </View>
        </View>
        <TextField label="Website" hint="Optional, starting with https://" value={draft.website} onChangeText={(v) => set('website', v)} autoCapitalize="none" maxLength={200} error={errors.website} testID="profile-website" />
        <View style={[styles.pair, wide && styles.pairWide]}>
          <View style={styles.half}>
            <TextField label="Language of dates" hint="A language tag: en-GB, en-US, de-DE…" value={draft.locale} onChangeText={(v) => set('locale', v)} autoCapitalize="none" maxLength={35} error={errors.locale} testID="profile-locale" />
          </View>
          <View style={styles.half}>
            <TextField label="Time zone" hint="Where the shop is: Europe/London, America/Chicago…" value={draft.timeZone} onChangeText={(v) => set('timeZone', v)} autoCapitalize="none" maxLength={64} error={errors.timeZone} testID="profile-time-zone" />
          </View>
        </View>
        <Body variant="small" tone="secondary" testID="profile-sample">
          {sample ? `A time on the papers reads: ${sample}.` : 'Give a language and a time zone to see how a time will read.'}
        </Body>
        <TextField
          label="Flag a piano idle in the workshop after"
          hint="Days in the workshop with no work items planned before the Workshop and Stock pages flag it."
          value={draft.workshopIdleDays}
          onChangeText={(v) => set('workshopIdleDays', v)}
          keyboardType="number-pad"
          inputMode="numeric"
          short
          maxLength={3}
          error={errors.workshopIdleDays}
          testID="profile-idle-days"
        />
      </Card>
      <Card role="region" accessibilityLabel="How the letterhead reads" testID="profile-preview">
        <Body variant="label" tone="secondary">
          How the letterhead reads on the signed copy
        </Body>
        {lines.length ? lines.map((l) => <Body key={l}>{l}</Body>) : <Body tone="quiet">No address or contact yet: the papers then name the dealer only.</Body>}
      </Card>
      <View style={styles.save}>
        <Button label="Save the shop details" onPress={submit} busy={save.busy} testID="profile-save" />
      </View>
      {feedback ? (
        <Notice tone={feedback.tone} testID="profile-feedback">
          {feedback.text}
        </Notice>
      ) : null}
    </>
  );
}

const capital = (t: string) => `${t.charAt(0).toUpperCase()}${t.slice(1)}${/[.!?]$/.test(t) ? '' : '.'}`;

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  pair: { gap: SPACE.md },
  pairWide: { flexDirection: 'row' },
  half: { flex: 1, minWidth: 0 },
  save: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
});
