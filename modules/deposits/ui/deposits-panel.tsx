import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useCan } from '@/modules/accounts/ui/use-can';
import { balanceDue, type Balance } from '@/modules/deposits/core/deposit';
import { dayAndTime, isCurrency, longDay, money, deviceLocality } from '@/modules/disclosure/ui/disclosure-format';
import { PALETTE, RADIUS, SPACE, STAGE_TONES } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { BalanceTable } from './components/balance-table';
import { usePianoDeposits, usePianoStage, useRecordDelivery, useRecordSale, useRefundDeposit, useReleaseHold, type DepositRow } from './use-deposits';

// Staff read times in their own device's zone: the shop's own tablets and desks.
const STAFF_TIME = deviceLocality();

type Feedback = { tone: 'success' | 'error'; text: string } | null;

/** How a deposit stands, in the floor's words. */
export function depositStatusText(d: DepositRow): string {
  const amount = money(d.amountMinor, d.currency);
  switch (d.status) {
    case 'pending':
      return `${amount}: checkout started ${dayAndTime(d.createdAt, STAFF_TIME)}, not paid`;
    case 'holding':
      return `${amount}: holding the piano until ${longDay(d.holdExpiresAt, STAFF_TIME)}`;
    case 'applied':
      return `${amount}: applied to the sale`;
    case 'released':
      return d.refundId ? `${amount}: hold released, refunded ${money(d.refundedMinor, d.currency)}` : `${amount}: hold released, deposit kept`;
    case 'expired':
      return d.refundId ? `${amount}: hold expired, refunded` : `${amount}: hold expired ${longDay(d.holdExpiresAt, STAFF_TIME)}; the refund awaits a manager`;
    case 'refunding':
      return `${amount}: refund asked of the payment provider, not yet made`;
    case 'refunded':
      return `${amount}: refunded ${money(d.refundedMinor || d.amountMinor, d.currency)}`;
    case 'cancelled':
      return `${amount}: checkout ended unpaid`;
    default:
      return `${amount}: ${d.status}`;
  }
}

/**
 * A piano's deposits and its sale: the hold and who it is for, the balance due, releasing or
 * refunding (managers), and recording the sale and the delivery (floor staff and managers).
 */
export function DepositsPanel({ pianoId, onChanged }: { pianoId: number; onChanged?: () => void }) {
  const { data, error, refresh } = usePianoDeposits(pianoId);
  const { piano, refresh: refreshStage } = usePianoStage(pianoId);
  const sale = useRecordSale();
  const delivery = useRecordDelivery();
  const [confirming, setConfirming] = useState<'sale' | 'delivery' | null>(null);
  const [feedback, setFeedback] = useState<Feedback>(null);
  const [soldBalance, setSoldBalance] = useState<Balance | null>(null);
  const problem = graphProblem(error);
  const can = useCan();
  const manager = can('manageDeposits');
  const seller = can('sellPianos');

  const changed = () => {
    refresh();
    refreshStage();
    onChanged?.();
  };

  if (!data) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading deposits…" />;
  const holding = data.deposits.find((d) => d.status === 'holding') ?? null;
  const others = data.deposits.filter((d) => d !== holding);
  const stage = piano?.stage ?? null;
  const r = data.rules;

  const recordSale = async () => {
    setFeedback(null);
    const outcome = await sale.run({ pianoId });
    setConfirming(null);
    if (!outcome.ok) setFeedback({ tone: 'error', text: outcome.problem.message });
    else {
      setSoldBalance(outcome.data.balance);
      setFeedback({ tone: 'success', text: outcome.data.balance ? `Sale recorded. Balance due from the buyer: ${money(outcome.data.balance.balanceMinor, outcome.data.balance.currency)}.` : 'Sale recorded.' });
    }
    changed();
  };
  const recordDelivery = async () => {
    setFeedback(null);
    const outcome = await delivery.run({ pianoId });
    setConfirming(null);
    setFeedback(outcome.ok ? { tone: 'success', text: 'Delivery recorded. Remind the buyer to book a tuning a few weeks after the move.' } : { tone: 'error', text: outcome.problem.message });
    changed();
  };

  // After the sale the server's balance no longer counts the deposit (it is applied, not holding): count it here.
  const applied = data.deposits.find((d) => d.status === 'applied');
  const balance =
    soldBalance ??
    (data.balance && applied && !holding && isCurrency(data.balance.currency)
      ? balanceDue(data.balance.priceMinor, applied.amountMinor, data.balance.currency, data.rules)
      : data.balance);
  return (
    <View style={styles.wrap} testID="deposits-panel">
      <View style={styles.stageLine}>
        {stage ? <StageBadge stage={stage} testID="deposits-stage" /> : null}
        <Body variant="small" tone="secondary">
          Deposit {r.percent} % of the price, at least {piano?.priceCurrency ?? ''} {r.minimumMajor.toLocaleString('en-US')}; hold {r.holdDays} days; sales tax {r.salesTaxPct} %.
        </Body>
      </View>

      {holding ? <HoldCard deposit={holding} manager={manager} onChanged={changed} /> : null}

      {balance ? (
        <Card>
          <Body variant="subheading">{stage === 'sold' || stage === 'delivered' ? 'Balance at the sale' : 'Balance due at the sale'}</Body>
          <BalanceTable balance={balance} testID="deposits-balance" />
        </Card>
      ) : (
        <Body tone="secondary">This piano has no asking price yet: the balance shows once a manager sets one.</Body>
      )}

      {seller && (stage === 'on_floor' || stage === 'held') ? (
        <Confirmable
          open={confirming === 'sale'}
          onOpen={() => setConfirming('sale')}
          onCancel={() => setConfirming(null)}
          onConfirm={recordSale}
          busy={sale.busy}
          label="Record the sale"
          question={holding ? `Record the sale to ${holding.buyerName}? Their deposit of ${money(holding.amountMinor, holding.currency)} is applied to the price.` : 'Record the sale? No deposit is holding this piano, so the whole price is due.'}
          testID="record-sale"
        />
      ) : null}
      {seller && stage === 'sold' ? (
        <Confirmable
          open={confirming === 'delivery'}
          onOpen={() => setConfirming('delivery')}
          onCancel={() => setConfirming(null)}
          onConfirm={recordDelivery}
          busy={delivery.busy}
          label="Record the delivery"
          question="Record that the piano has been delivered to the buyer? Moves are for trained movers with proper equipment."
          testID="record-delivery"
        />
      ) : null}
      {feedback ? (
        <Notice tone={feedback.tone} testID="deposits-feedback">
          {feedback.text}
        </Notice>
      ) : null}

      {others.length ? (
        <View style={styles.history}>
          <Body variant="label" tone="secondary">
            {holding ? 'Other deposits for this piano' : 'Deposits for this piano'}
          </Body>
          <View role="list" style={styles.list}>
            {others.map((d) => (
              <DepositLine key={d.id} deposit={d} manager={manager} onChanged={changed} />
            ))}
          </View>
        </View>
      ) : holding ? null : (
        <Body tone="secondary" testID="deposits-none">
          No deposit has been paid for this piano.
        </Body>
      )}
    </View>
  );
}

function HoldCard({ deposit, manager, onChanged }: { deposit: DepositRow; manager: boolean; onChanged: () => void }) {
  const release = useReleaseHold();
  const [choice, setChoice] = useState<'refund' | 'keep' | null>(null);
  const [why, setWhy] = useState('');
  const [feedback, setFeedback] = useState<Feedback>(null);

  const confirm = async () => {
    if (!choice) return;
    setFeedback(null);
    const outcome = await release.run({ depositId: deposit.id, refund: choice === 'refund', why: why.trim() || null });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setChoice(null);
    setWhy('');
    onChanged();
  };

  return (
    <View style={styles.hold} testID="deposits-holding">
      <Body variant="subheading">
        Held for {deposit.buyerName} until {longDay(deposit.holdExpiresAt, STAFF_TIME)}
      </Body>
      <Body variant="small" tone="secondary" selectable>
        {money(deposit.amountMinor, deposit.currency)} paid online {dayAndTime(deposit.paidAt, STAFF_TIME)} · {deposit.buyerEmail}
      </Body>
      {manager ? (
        <View style={styles.releaseBox}>
          <View style={styles.buttons}>
            <Button label="Release and refund" variant={choice === 'refund' ? 'primary' : 'secondary'} onPress={() => setChoice(choice === 'refund' ? null : 'refund')} testID={`release-refund-${deposit.id}`} />
            <Button label="Release, keep the deposit" variant={choice === 'keep' ? 'primary' : 'secondary'} onPress={() => setChoice(choice === 'keep' ? null : 'keep')} testID={`release-keep-${deposit.id}`} />
          </View>
          {choice ? (
            <View style={styles.confirm}>
              <Body>
                {choice === 'refund'
                  ? `The piano goes back on the floor and ${money(deposit.amountMinor, deposit.currency)} is refunded to ${deposit.buyerName}'s card.`
                  : `The piano goes back on the floor and the deposit is kept under the shop's terms of sale. ${deposit.buyerName} is told by e-mail.`}
              </Body>
              <TextField label="Reason" hint="Optional: kept in the piano’s history." value={why} onChangeText={setWhy} maxLength={500} testID={`release-why-${deposit.id}`} />
              <View style={styles.buttons}>
                <Button label={choice === 'refund' ? 'Confirm: release and refund' : 'Confirm: release, keep'} variant="danger" onPress={confirm} busy={release.busy} testID={`release-confirm-${deposit.id}`} />
                <Button label="Cancel" variant="quiet" onPress={() => setChoice(null)} />
              </View>
            </View>
          ) : null}
        </View>
      ) : null}
      {feedback ? <Notice tone={feedback.tone}>{feedback.text}</Notice> : null}
    </View>
  );
}

function DepositLine({ deposit, manager, onChanged }: { deposit: DepositRow; manager: boolean; onChanged: () => void }) {
  const refund = useRefundDeposit();
  const [problem, setProblem] = useState<string | null>(null);
  const refundable = manager && (deposit.status === 'released' || deposit.status === 'expired') && !deposit.refundId;
  const run = async () => {
    setProblem(null);
    const outcome = await refund.run({ depositId: deposit.id });
    if (!outcome.ok) setProblem(outcome.problem.message);
    onChanged();
  };
  return (
    <View role="listitem" style={styles.line} testID={`deposit-line-${deposit.id}`}>
      <View style={styles.lineText}>
        <Body variant="bodyStrong">{deposit.buyerName}</Body>
        <Body variant="small" tone="secondary">
          {depositStatusText(deposit)}
        </Body>
        {deposit.closeReason ? (
          <Body variant="small" tone="quiet">
            {deposit.closeReason}
          </Body>
        ) : null}
      </View>
      {refundable ? <Button label="Refund" variant="secondary" onPress={run} busy={refund.busy} testID={`refund-${deposit.id}`} /> : null}
      {problem ? (
        <View style={styles.lineProblem}>
          <Notice tone="error">{problem}</Notice>
        </View>
      ) : null}
    </View>
  );
}

interface ConfirmableProps {
  open: boolean;
  onOpen: () => void;
  onCancel: () => void;
  onConfirm: () => void;
  busy: boolean;
  label: string;
  question: string;
  testID: string;
}

/** A command that asks once more, in words, before it changes the piano's stage. */
function Confirmable({ open, onOpen, onCancel, onConfirm, busy, label, question, testID }: ConfirmableProps) {
  if (!open) {
    return (
      <View style={styles.buttons}>
        <Button label={label} onPress={onOpen} testID={testID} />
      </View>
    );
  }
  return (
    <View style={styles.confirm}>
      <Body>{question}</Body>
      <View style={styles.buttons}>
        <Button label={`Confirm: ${label.toLowerCase()}`} onPress={onConfirm} busy={busy} testID={`${testID}-confirm`} />
        <Button label="Cancel" variant="quiet" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.md },
  stageLine: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
  hold: { gap: SPACE.sm, padding: SPACE.lg, borderRadius: RADIUS.lg, backgroundColor: STAGE_TONES.held.ground, borderLeftWidth: 4, borderLeftColor: STAGE_TONES.held.edge },
  releaseBox: { gap: SPACE.sm, paddingTop: SPACE.xs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  confirm: { gap: SPACE.sm, padding: SPACE.md, borderRadius: RADIUS.md, borderWidth: 1, borderColor: PALETTE.linenDark, backgroundColor: PALETTE.vellum },
  history: { gap: SPACE.xs },
  list: { borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, backgroundColor: PALETTE.vellum, overflow: 'hidden' },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.md, padding: SPACE.md, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  lineText: { flex: 1, minWidth: 200, gap: SPACE.xxs },
  lineProblem: { width: '100%' },
});
