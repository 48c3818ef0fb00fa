import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { acknowledgeInput } from '@/modules/disclosure/core/disclosure';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Checkbox } from '@/modules/theme/ui/checkbox';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import type { AckReceipt } from '../buyer-memory';
import { dayAndTime } from '../disclosure-format';
import { postAcknowledgement, type PublicDisclosure } from '../public-disclosure';

type Field = 'fullName' | 'email' | 'read';
type Errors = Partial<Record<Field, string>>;

interface AcknowledgeFormProps {
  token: string;
  disclosure: PublicDisclosure;
  /** what this device remembers the buyer acknowledged, if anything */
  receipt: AckReceipt | null;
  onAcknowledged: (receipt: AckReceipt) => void;
  /** the server says a newer version exists: read it again */
  onStale: () => void;
}

/** The buyer says, in their own name, that they read this version; the dealer countersigns later. */
export function AcknowledgeForm({ token, disclosure, receipt, onAcknowledged, onStale }: AcknowledgeFormProps) {
  const [fullName, setFullName] = useState(receipt?.fullName ?? '');
  const [email, setEmail] = useState(receipt?.email ?? '');
  const [read, setRead] = useState(false);
  const [errors, setErrors] = useState<Errors>({});
  const [problem, setProblem] = useState<{ title?: string; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const dealer = disclosure.content.dealerName;
  const when = (iso: string) => dayAndTime(iso, disclosure.dealer);

  if (receipt && receipt.digest === disclosure.digest) {
    return (
      <View role="region" aria-label="Your acknowledgement" style={styles.section}>
        <Heading level={2}>Your acknowledgement</Heading>
        <Notice tone="success" title={`Thank you, ${receipt.fullName}.`} testID="ack-done">
          {receipt.already
            ? `You had already acknowledged version ${receipt.version} of this disclosure, on ${when(receipt.acknowledgedAt)}: that acknowledgement stands, once. ${dealer} countersigns it and e-mails the signed copy to ${receipt.email}.`
            : `You acknowledged version ${receipt.version} of this disclosure on ${when(receipt.acknowledgedAt)}. ${dealer} will countersign it and e-mail the signed copy to ${receipt.email}. Keep that e-mail: it is your record of what you were told.`}
        </Notice>
      </View>
    );
  }

  const submit = async () => {
    setProblem(null);
    const parsed = acknowledgeInput.safeParse({ fullName, email, read: read || undefined, digest: disclosure.digest });
    if (!parsed.success) {
      const found: Errors = {};
      for (const issue of parsed.error.issues) {
        const field = issue.path[0] as Field;
        if (field === 'read') found.read = 'Tick the box to say you have read the disclosure.';
        else if (field === 'fullName' || field === 'email') found[field] ??= sentence(issue.message);
      }
      setErrors(found);
      return;
    }
    setErrors({});
    setBusy(true);
    const outcome = await postAcknowledgement(token, { fullName: parsed.data.fullName, email: parsed.data.email, read: true, digest: disclosure.digest });
    setBusy(false);
    if (outcome.ok) {
      const a = outcome.answer;
      // The name and e-mail on record: the first acknowledgement's, when this buyer had sent one before.
      onAcknowledged({ acknowledgementId: a.acknowledgementId, receiptToken: a.receiptToken, version: a.version, digest: a.digest, acknowledgedAt: a.acknowledgedAt, fullName: a.buyerName, email: a.buyerEmail, already: a.already });
      return;
    }
    if (outcome.status === 409) {
      setRead(false);
      setProblem({ title: 'The disclosure changed while you were reading', text: `${outcome.message} The newest version is now on this page.` });
      onStale();
      return;
    }
    if (outcome.field === 'fullName' || outcome.field === 'email' || outcome.field === 'read') {
      setErrors({ [outcome.field]: sentence(outcome.message) });
      return;
    }
    setProblem({ text: outcome.message });
  };

  return (
    <View role="region" aria-label="Acknowledge this disclosure" style={styles.section}>
      <Heading level={2}>Acknowledge this disclosure</Heading>
      {receipt ? (
        <Notice tone="info" title="The disclosure was updated after you acknowledged it" testID="ack-stale">
          You acknowledged version {receipt.version} on {when(receipt.acknowledgedAt)}. This is version {disclosure.version}: read it, then acknowledge it again.
        </Notice>
      ) : null}
      <Card role="form" accessibilityLabel="Acknowledge this disclosure">
        <Body>
          Type your name and e-mail to record that you have read version {disclosure.version} of this disclosure. {dealer} then countersigns it and e-mails you the signed copy. Acknowledging does not commit you to buy.
        </Body>
        {problem ? (
          <Notice tone="error" title={problem.title} testID="ack-problem">
            {problem.text}
          </Notice>
        ) : null}
        <TextField label="Full name" value={fullName} onChangeText={setFullName} error={errors.fullName} autoComplete="name" autoCapitalize="words" maxLength={120} testID="ack-name" />
        <TextField
          label="E-mail"
          hint="The signed copy is sent here."
          value={email}
          onChangeText={setEmail}
          error={errors.email}
          keyboardType="email-address"
          inputMode="email"
          autoComplete="email"
          autoCapitalize="none"
          maxLength={254}
          testID="ack-email"
        />
        <View style={styles.check}>
          <Checkbox label="I have read this disclosure" checked={read} onChange={setRead} testID="ack-read" />
          {errors.read ? (
            <Body variant="small" tone="danger" style={styles.checkError}>
              {errors.read}
            </Body>
          ) : null}
        </View>
        <View style={styles.submit}>
          <Button label={`Acknowledge version ${disclosure.version}`} onPress={submit} busy={busy} testID="ack-submit" />
        </View>
      </Card>
    </View>
  );
}

/** "type your full name" becomes "Type your full name." beside the field. */
function sentence(text: string): string {
  const t = text.trim();
  return `${t.charAt(0).toUpperCase()}${t.slice(1)}${/[.!?]$/.test(t) ? '' : '.'}`;
}

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  check: { gap: SPACE.xxs, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingTop: SPACE.sm },
  checkError: { paddingLeft: 36 },
  submit: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, paddingTop: SPACE.xs },
});
