import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem, problemWithoutField } from '@/modules/accounts/ui/graph-error';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { DEALER_TEMPLATE_ADVICE } from '@/modules/disclosure/core/disclosure';
import { ShopProfileSection } from '@/modules/shop/ui/shop-profile-form';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { useSaveShopTexts, useShopTexts, type ShopTexts } from './use-shop-texts';

// The same bounds the server's textsInput holds.
const NAME_MAX = 120;
const WARRANTY_MAX = 4000;

type FieldErrors = Partial<Record<keyof ShopTexts, string>>;

function problemsOf(t: ShopTexts): FieldErrors {
  const out: FieldErrors = {};
  const name = t.dealerName.trim();
  const warranty = t.warranty.trim();
  if (!name) out.dealerName = 'The name buyers see on a disclosure: it cannot be empty.';
  else if (name.length > NAME_MAX) out.dealerName = `At most ${NAME_MAX} characters.`;
  if (!warranty) out.warranty = 'The warranty cannot be empty.';
  else if (warranty.length > WARRANTY_MAX) out.warranty = `At most ${WARRANTY_MAX} characters.`;
  return out;
}

/** The manager's page for the texts every new disclosure carries: the dealer's name and the warranty. */
export function ShopTextsScreen() {
  return (
    <AbilityGate ability="editShopTexts" title="Shop details and texts">
      <ShopTextsLoader />
    </AbilityGate>
  );
}

function ShopTextsLoader() {
  const { texts, error, refresh } = useShopTexts();
  const problem = graphProblem(error);
  if (!texts) {
    return (
      <Screen title="Shop details and texts" eyebrow="Presenting" width="form">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the texts…" />}
      </Screen>
    );
  }
  return <ShopTextsEditor texts={texts} onSaved={refresh} />;
}

function ShopTextsEditor({ texts, onSaved }: { texts: ShopTexts; onSaved: () => void }) {
  const save = useSaveShopTexts();
  const [draft, setDraft] = useState<ShopTexts>(texts);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [feedback, setFeedback] = useState<{ tone: 'error' | 'success'; text: string } | null>(null);
  const changed = draft.dealerName !== texts.dealerName || draft.warranty !== texts.warranty;

  const set = (key: keyof ShopTexts, value: string) => {
    setDraft((prev) => ({ ...prev, [key]: value }));
    setErrors((prev) => ({ ...prev, [key]: undefined }));
  };

  const submit = async () => {
    setFeedback(null);
    const problems = problemsOf(draft);
    setErrors(problems);
    if (Object.keys(problems).length) {
      setFeedback({ tone: 'error', text: 'Some texts need fixing: see the fields marked in red.' });
      return;
    }
    const outcome = await save.run({ t: { dealerName: draft.dealerName.trim(), warranty: draft.warranty.trim() } });
    if (!outcome.ok) {
      const field = outcome.problem.field;
      if (field === 'dealerName' || field === 'warranty') setErrors({ [field]: problemWithoutField(outcome.problem) });
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setDraft(outcome.data);
    setFeedback({ tone: 'success', text: 'Saved. Disclosures published from now on carry these texts.' });
    onSaved();
  };

  return (
    <Screen
      title="Shop details and texts"
      eyebrow="Presenting"
      width="form"
      headingTestID="texts-heading"
      actions={<Button label="Workshop" variant="secondary" href="/workshop" />}
    >
      <Body tone="secondary">Who the shop is on every paper a buyer is handed, and the texts every condition disclosure carries.</Body>
      <Notice tone="caution" title="Templates, not legal advice" testID="texts-legal">
        {`${DEALER_TEMPLATE_ADVICE} This advice is for you: buyers never see it.`}
      </Notice>
      <ShopProfileSection />
      <Heading level={2}>Disclosure texts</Heading>
      <Body tone="secondary">The dealer’s name and warranty printed on every condition disclosure a buyer reads and signs.</Body>
      <Notice tone="info" testID="texts-applies">
        New texts appear on disclosures published from now on. A published disclosure never changes: to give a piano the new text, publish its disclosure again.
      </Notice>
      <Card role="form" accessibilityLabel="Disclosure texts">
        <TextField label="Dealer name" hint="As buyers know the shop." value={draft.dealerName} onChangeText={(v) => set('dealerName', v)} maxLength={NAME_MAX} error={errors.dealerName} testID="texts-dealer-name" />
        <View style={styles.warranty}>
          <TextField label="Warranty" value={draft.warranty} onChangeText={(v) => set('warranty', v)} multiline maxLength={WARRANTY_MAX} error={errors.warranty} testID="texts-warranty" />
          <Body variant="small" tone="quiet" testID="texts-warranty-count">
            {`${draft.warranty.trim().length} of ${WARRANTY_MAX} characters`}
          </Body>
        </View>
      </Card>
      <Card role="region" accessibilityLabel="How the warranty reads" testID="texts-preview">
        <Body variant="label" tone="secondary">
          How the warranty reads on a disclosure
        </Body>
        <Body variant="bodyStrong">{draft.dealerName.trim() || 'Dealer name'}</Body>
        <Body selectable>{draft.warranty.trim() || 'No warranty text yet.'}</Body>
      </Card>
      <View style={styles.save}>
        <Button label="Save the texts" onPress={submit} busy={save.busy} disabled={!changed && !save.busy} testID="texts-save" />
        <Button label="Undo my changes" variant="quiet" onPress={() => setDraft(texts)} disabled={!changed} testID="texts-undo" />
      </View>
      {feedback ? (
        <Notice tone={feedback.tone} testID="texts-feedback">
          {feedback.text}
        </Notice>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  warranty: { gap: SPACE.xs },
  save: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, alignItems: 'center' },
});
