import { useEffect } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { writeCheckout } from '@/modules/disclosure/ui/buyer-memory';
import { BuyerFrame } from '@/modules/disclosure/ui/components/buyer-frame';
import { dayAndTime, money, pianoTitle } from '@/modules/disclosure/ui/disclosure-format';
import { usePublicDisclosure } from '@/modules/disclosure/ui/use-public-disclosure';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';

import { BalanceTable } from './components/balance-table';
import type { PublicDepositStatus } from './public-deposit';
import { useDepositStatus } from './use-deposit-status';

/** Where the payment page sends the buyer back: waits for the payment to land, then shows the hold and the balance. */
export function DepositConfirmationScreen({ token, sessionId }: { token: string | null; sessionId: string | null }) {
  const { result: disclosureResult } = usePublicDisclosure(token, null);
  const { result, waitedLong, retry } = useDepositStatus(token, sessionId);
  const disclosure = disclosureResult?.state === 'ok' ? disclosureResult.data : null;
  const dealer = disclosure?.content.dealerName ?? null;
  const piano = disclosure ? pianoTitle(disclosure.content.piano) : null;
  const back = token ? <Button label="Back to the disclosure" variant="secondary" href={`/d/${token}`} testID="deposit-back" /> : null;

  const held = result?.state === 'ok' && result.data.status === 'holding';
  useEffect(() => {
    // This device remembers the paid checkout, so the disclosure page can lead back to the hold.
    if (held && token && sessionId) writeCheckout(token, sessionId);
  }, [held, token, sessionId]);

  let body;
  if (!token || !sessionId || result?.state === 'missing') {
    body = (
      <View style={styles.block} testID="deposit-missing">
        <Heading level={1}>We cannot find this payment</Heading>
        <Body tone="secondary">The address may be cut short. If you paid, the e-mailed receipt has the details; the dealer can look the payment up too.</Body>
        {back}
      </View>
    );
  } else if (!result || (result.state === 'ok' && result.data.status === 'pending')) {
    body = (
      <View style={styles.block}>
        <Heading level={1}>Confirming your payment</Heading>
        <View role="status" style={styles.waiting} testID="deposit-pending">
          <ActivityIndicator color={PALETTE.felt} />
          <Body>The payment provider is telling us about your payment. This usually takes a few seconds: keep this page open.</Body>
        </View>
        {waitedLong ? (
          <Notice tone="info" title="Still waiting for the confirmation">
            If you completed the payment, you will get a receipt by e-mail as soon as it is confirmed; this page keeps checking. If you left the payment page before paying, nothing was charged.
          </Notice>
        ) : null}
      </View>
    );
  } else if (result.state === 'error') {
    body = (
      <View style={styles.block}>
        <Heading level={1}>Your deposit</Heading>
        <Notice tone="error" title="The payment could not be looked up" actions={<Button label="Try again" variant="secondary" onPress={retry} />}>
          {result.message}
        </Notice>
      </View>
    );
  } else {
    body = <Outcome status={result.data} dealer={dealer} piano={piano} />;
  }

  return (
    <BuyerFrame dealerName={dealer} kind="Your deposit" documentTitle={piano ? `Your deposit: ${piano}` : 'Your deposit'}>
      {body}
      {result?.state === 'ok' && result.data.status !== 'pending' ? <View style={styles.back}>{back}</View> : null}
    </BuyerFrame>
  );
}

function Outcome({ status: s, dealer, piano }: { status: PublicDepositStatus; dealer: string | null; piano: string | null }) {
  const amount = money(s.amountMinor, s.currency);
  const what = piano ? `the ${piano} (stock number ${s.stockNumber})` : `piano ${s.stockNumber}`;
  const shop = dealer ?? 'The dealer';
  switch (s.status) {
    case 'holding':
      return (
        <View style={styles.block}>
          <Heading level={1}>Thank you, {s.buyerName}</Heading>
          <View style={styles.heldBox} testID="deposit-held">
            <Body variant="label" style={styles.heldEyebrow}>
              Deposit received: {amount}
            </Body>
            <Body variant="title" style={styles.heldText}>
              Held for you until {dayAndTime(s.holdExpiresAt, s.dealer)}
            </Body>
            <Body style={styles.heldText}>{`${shop} has taken ${what} off the floor for you.`}</Body>
          </View>
          <Notice tone="success" title="Receipt on its way" testID="deposit-receipt-note">
            A receipt for your deposit is on its way to the address you gave with your acknowledgement.
          </Notice>
          {s.balance ? (
            <Card>
              <Heading level={2}>Balance due at the sale</Heading>
              <BalanceTable balance={s.balance} testID="deposit-balance" />
              <Body variant="small" tone="secondary">
                Pay the balance when you complete the purchase with {dealer ?? 'the dealer'}, before the hold ends. Delivery is arranged then.
              </Body>
            </Card>
          ) : null}
        </View>
      );
    case 'refunded':
      return (
        <View style={styles.block} testID="deposit-refunded">
          <Heading level={1}>Your deposit was refunded</Heading>
          <Notice tone="info" title={s.holdExpiresAt ? 'The hold has ended' : 'Another buyer’s deposit arrived first'}>
            {s.holdExpiresAt
              ? `Your deposit of ${amount} for ${what} has been refunded in full. Your card provider shows it within a few days.`
              : `Another buyer’s deposit for ${what} reached ${dealer ?? 'the dealer'} moments before yours, so the piano is held for them. Your deposit of ${amount} has been refunded in full; your card provider shows it within a few days. We are sorry for the disappointment.`}
          </Notice>
        </View>
      );
    case 'refunding':
      return (
        <View style={styles.block} testID="deposit-refunding">
          <Heading level={1}>Your deposit is being refunded</Heading>
          <Notice tone="info" title={s.holdExpiresAt ? 'The hold has ended' : 'Another buyer’s deposit arrived first'}>
            {s.holdExpiresAt
              ? `The hold on ${what} has ended and ${shop} is refunding your deposit of ${amount} in full. You get an e-mail once the refund is made; your card provider then shows it within a few days.`
              : `Another buyer’s deposit for ${what} reached ${dealer ?? 'the dealer'} moments before yours, so the piano is held for them. ${shop} is refunding your deposit of ${amount} in full; you get an e-mail once the refund is made. We are sorry for the disappointment.`}
          </Notice>
        </View>
      );
    case 'applied':
      return (
        <View style={styles.block} testID="deposit-applied">
          <Heading level={1}>Your deposit went toward the sale</Heading>
          <Body>{`Your deposit of ${amount} was counted toward the price of ${what}.`}</Body>
          {s.balance ? (
            <Card>
              <BalanceTable balance={s.balance} testID="deposit-balance" />
            </Card>
          ) : null}
        </View>
      );
    case 'released':
    case 'expired':
      return (
        <View style={styles.block} testID={`deposit-${s.status}`}>
          <Heading level={1}>The hold has ended</Heading>
          <Body>
            {s.status === 'expired' ? `The hold on ${what} ended on ${dayAndTime(s.holdExpiresAt, s.dealer)}` : `${shop} released the hold on ${what}`}. What happens to your deposit of {amount} follows the terms you agreed to; {dealer ?? 'the dealer'} will be in touch, or ask them.
          </Body>
        </View>
      );
    case 'cancelled':
      return (
        <View style={styles.block} testID="deposit-cancelled">
          <Heading level={1}>The payment was not completed</Heading>
          <Body>The checkout ended without a payment, so nothing was charged and the piano is not held. You can start again from the disclosure.</Body>
        </View>
      );
    default:
      return (
        <View style={styles.block}>
          <Heading level={1}>Your deposit</Heading>
          <Body>{`Your deposit of ${amount} for ${what} is recorded. Ask ${dealer ?? 'the dealer'} how it stands.`}</Body>
        </View>
      );
  }
}

const styles = StyleSheet.create({
  block: { gap: SPACE.lg },
  waiting: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md },
  heldBox: { backgroundColor: PALETTE.felt, borderRadius: RADIUS.lg, padding: SPACE.xl, gap: SPACE.xs, borderLeftWidth: 6, borderLeftColor: PALETTE.brass },
  heldEyebrow: { color: PALETTE.feltLichen, textTransform: 'uppercase', letterSpacing: 1 },
  heldText: { color: PALETTE.ivory },
  back: { flexDirection: 'row' },
});
