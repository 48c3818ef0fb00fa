import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import type { AckReceipt } from '@/modules/disclosure/ui/buyer-memory';
import { money } from '@/modules/disclosure/ui/disclosure-format';
import type { PublicDisclosure } from '@/modules/disclosure/ui/public-disclosure';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';

import { depositQuote, depositTerms } from '../deposit-terms';
import { startDeposit } from '../public-deposit';

interface DepositOfferProps {
  token: string;
  disclosure: PublicDisclosure;
  /** the buyer's acknowledgement on this device */
  receipt: AckReceipt | null;
  /** the checkout this device paid earlier, to find the hold again */
  paidSession: string | null;
}

/** After the buyer acknowledged the newest version of an available piano: the deposit's terms and the way to pay it. */
export function DepositOffer({ token, disclosure, receipt, paidSession }: DepositOfferProps) {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  // The server's figure, when it differs from the one shown: the buyer confirms it before paying.
  const [differs, setDiffers] = useState<{ url: string; amount: string } | null>(null);
  const c = disclosure.content;
  const current = !!receipt && receipt.digest === disclosure.digest && disclosure.isNewest;

  if (paidSession && !disclosure.available) {
    return (
      <View role="region" aria-label="Your deposit" style={styles.section}>
        <Heading level={2}>Your deposit</Heading>
        <Notice tone="info" actions={<Button label="See your hold" variant="secondary" href={`/d/${token}/deposit?session=${paidSession}`} testID="deposit-see-hold" />}>
          You paid a deposit for this piano from this device. See how your hold stands.
        </Notice>
      </View>
    );
  }
  if (!current) return null;
  if (!disclosure.available) {
    return (
      <View role="region" aria-label="Deposit" style={styles.section}>
        <Heading level={2}>Hold this piano</Heading>
        <Notice tone="info" testID="deposit-unavailable">
          This piano cannot be held with a deposit right now: it is held for another buyer or no longer on the floor. Ask {c.dealerName} about similar pianos.
        </Notice>
      </View>
    );
  }
  const quote = depositQuote(disclosure);
  if (!quote) {
    return (
      <View role="region" aria-label="Deposit" style={styles.section}>
        <Heading level={2}>Hold this piano</Heading>
        <Notice tone="info">This piano has no asking price yet, so it cannot be held online. Ask {c.dealerName} to hold it for you.</Notice>
      </View>
    );
  }

  const start = async () => {
    setProblem(null);
    setBusy(true);
    const outcome = await startDeposit(token, receipt!.receiptToken);
    if (!outcome.ok) {
      setBusy(false);
      setProblem(outcome.message);
      return;
    }
    if (outcome.amountMinor !== quote.amountMinor || outcome.currency.toUpperCase() !== quote.currency.toUpperCase()) {
      setBusy(false);
      setDiffers({ url: outcome.url, amount: money(outcome.amountMinor, outcome.currency.toUpperCase()) });
      return;
    }
    go(outcome.url);
  };
  // Off to the payment provider's page; it sends the buyer back to the confirmation page.
  const go = (url: string) => {
    if (Platform.OS === 'web' && typeof window !== 'undefined') window.location.assign(url);
  };

  return (
    <View role="region" aria-label="Hold this piano with a deposit" style={styles.section}>
      <Heading level={2}>Hold this piano with a deposit</Heading>
      <Card>
        <View style={styles.amount}>
          <Body variant="label" tone="secondary">
            Deposit
          </Body>
          <Body variant="title" testID="deposit-amount">
            {money(quote.amountMinor, quote.currency)}
          </Body>
          <Body variant="small" tone="secondary">
            Held for you for {quote.holdDays} days · counts toward the price
          </Body>
        </View>
        <View style={styles.terms}>
          <Body variant="label" tone="accent" style={styles.termsTitle}>
            Deposit terms
          </Body>
          <View role="list" style={styles.termList}>
            {depositTerms(quote, c.dealerName).map((t, i) => (
              <View role="listitem" key={i} style={styles.term}>
                <Body tone="secondary" style={styles.termNumber}>
                  {i + 1}.
                </Body>
                <Body style={styles.termText}>{t}</Body>
              </View>
            ))}
          </View>
        </View>
        {problem ? (
          <Notice tone="error" testID="deposit-problem">
            {problem}
          </Notice>
        ) : null}
        {differs ? (
          <Notice
            tone="caution"
            title={`The deposit is ${differs.amount}`}
            actions={<Button label={`Continue to pay ${differs.amount}`} onPress={() => go(differs.url)} testID="deposit-continue" />}
            testID="deposit-differs"
          >
            {`${c.dealerName}’s current deposit rules ask ${differs.amount}, not the amount shown above, and may set a different length of hold: the confirmation after payment shows the date your hold ends. Continue only if that suits you.`}
          </Notice>
        ) : (
          <View style={styles.buttons}>
            <Button label="Hold this piano with a deposit" onPress={start} busy={busy} testID="deposit-start" />
          </View>
        )}
        <Body variant="small" tone="quiet">
          The payment provider’s page shows the amount again before you pay; afterwards you come back here to see your hold.
        </Body>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  amount: { gap: SPACE.xxs, paddingBottom: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  terms: { gap: SPACE.sm },
  termsTitle: { textTransform: 'uppercase', letterSpacing: 1 },
  termList: { gap: SPACE.sm },
  term: { flexDirection: 'row', gap: SPACE.sm },
  termNumber: { width: 22 },
  termText: { flex: 1, minWidth: 0 },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
});
