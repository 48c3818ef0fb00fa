import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { dayAndTime, deviceLocality, isCurrency, money } from '@/modules/disclosure/ui/disclosure-format';
import { OFFER_ANSWERS, OFFER_ANSWER_WORDS, type OfferAnswer } from '@/modules/pricing/core/offer-input';
import { CURRENCY_DIGITS, toMinor } from '@/modules/shop/core/money';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { usePianoOffer, useRecordAnswer, type AnswerView, type OfferView } from '../use-piano-money';
import { parseMajor } from './asking-price-form';
import { WorkedFigure } from './worked-figure';

// Staff read times in their own device's locale and zone.
const STAFF_TIME = deviceLocality();

const ANSWER_CHOICES: Record<OfferAnswer, string> = { accepted: 'Accepts', countered: 'Asks for more', agreed: 'Agreed at a figure', declined: 'Declines' };

/** The trade-in offer on the piano's page, for intake staff and managers: its lines, and what the seller said. */
export function OfferPanel({ pianoId }: { pianoId: number }) {
  const { user } = useSession();
  const allowed = !!user && can(user.role, 'readOffers');
  const { money: data, error } = usePianoOffer(pianoId, !allowed);
  if (!allowed) return null;
  const problem = graphProblem(error);
  if (!data) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Working out the offer…" />;
  const result = data.offer;
  if (!result || result.status === 'not_assessed') {
    return <EmptyState title="No offer yet">The offer is worked out once the inspection is in.</EmptyState>;
  }
  if (result.status === 'consignment' || !result.offer) {
    return <EmptyState title="No offer: taken on consignment">The dealer sells this piano for its owner and does not buy it, so there is nothing to offer.</EmptyState>;
  }
  return <OfferCard offer={result.offer} answers={data.answers ?? []} pianoId={pianoId} mayAnswer={!!user && can(user.role, 'answerOffers')} />;
}

function OfferCard({ offer, answers, pianoId, mayAnswer }: { offer: OfferView; answers: AnswerView[]; pianoId: number; mayAnswer: boolean }) {
  const wholesale = offer.basis === 'wholesale';
  const settled = answers.length ? answers[answers.length - 1] : null;
  return (
    <Card testID="offer-panel">
      <View style={styles.head}>
        <Body variant="label" tone="secondary">
          {wholesale ? 'Wholesale offer' : 'Trade-in offer'}
          {offer.provisional ? ' · provisional' : ''}
        </Body>
        <Body variant="title" testID="offer-amount">
          {money(offer.offerMinor, offer.currency)}
        </Body>
      </View>
      {offer.notes.map((note) => (
        <Notice key={note} tone={note.startsWith('Provisional') ? 'caution' : 'info'} testID="offer-note">
          {note}
        </Notice>
      ))}
      <WorkedFigure lines={offer.lines} currency={offer.currency} totalLabel={wholesale ? 'Wholesale offer' : 'Offer'} totalMinor={offer.offerMinor} testID="offer-lines" />
      <Body variant="small" tone="secondary">
        {offer.reconSource === 'plan' ? 'The reconditioning estimate is the work plan’s.' : `The reconditioning estimate is the work the inspection (version ${offer.assessmentVersion}) calls for, on the rate card.`}{' '}
        {offer.rounding} Pricing rules {offer.rulesVersion}.
      </Body>
      {answers.length ? <AnswerList answers={answers} /> : null}
      {mayAnswer && settled?.answer !== 'accepted' && settled?.answer !== 'agreed' ? <AnswerForm pianoId={pianoId} offer={offer} /> : null}
    </Card>
  );
}

function answerWords(a: AnswerView): string {
  const amount = a.answer === 'countered' ? `: asked for ${money(a.counterMinor ?? 0, a.currency)}` : a.answer === 'agreed' ? `: ${money(a.agreedMinor ?? 0, a.currency)}` : a.answer === 'accepted' ? `: ${money(a.offerMinor, a.currency)}` : '';
  return `${OFFER_ANSWER_WORDS[a.answer]}${amount}`;
}

function AnswerList({ answers }: { answers: AnswerView[] }) {
  return (
    <View style={styles.answers} role="list" testID="offer-answers">
      <Body variant="subheading">What the seller said</Body>
      {answers.map((a) => (
        <View key={a.id} role="listitem" style={styles.answer} testID="offer-answer">
          <Body variant="bodyStrong">{answerWords(a)}</Body>
          <Body variant="small" tone="secondary">
            Offer {money(a.offerMinor, a.currency)} · recorded by {a.recordedBy}, {dayAndTime(a.recordedAt, STAFF_TIME)}
            {a.note ? ` · “${a.note}”` : ''}
          </Body>
        </View>
      ))}
    </View>
  );
}

function AnswerForm({ pianoId, offer }: { pianoId: number; offer: OfferView }) {
  const [answer, setAnswer] = useState<OfferAnswer | null>(null);
  const [amount, setAmount] = useState('');
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [feedback, setFeedback] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const record = useRecordAnswer();
  const currency = isCurrency(offer.currency) ? offer.currency : 'USD';
  const needsAmount = answer === 'countered' || answer === 'agreed';

  const submit = async () => {
    setFeedback(null);
    if (!answer) {
      setError('Pick what the seller said.');
      return;
    }
    let figure: number | null = null;
    if (needsAmount) {
      const major = parseMajor(amount, currency);
      if (major == null) {
        setError(CURRENCY_DIGITS[currency] ? `Type the figure in ${currency}, e.g. 950 or 950.50.` : `Type the figure in whole ${currency}.`);
        return;
      }
      figure = toMinor(major, currency);
    }
    setError(null);
    const outcome = await record.run({
      i: { pianoId, answer, offeredMinor: offer.offerMinor, counterMinor: answer === 'countered' ? figure : null, agreedMinor: answer === 'agreed' ? figure : null, note: note.trim() || null },
    });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setFeedback({ tone: 'success', text: `Recorded: ${answerWords(outcome.data)}.` });
    setAnswer(null);
    setAmount('');
    setNote('');
  };

  return (
    <View style={styles.form} testID="offer-answer-form">
      <ChoiceGroup label="The seller" options={OFFER_ANSWERS} labels={ANSWER_CHOICES} value={answer} onChange={setAnswer} error={needsAmount ? null : error} testID="offer-answer-choice" />
      {needsAmount ? (
        <TextField
          label={answer === 'countered' ? 'The figure the seller asked for' : 'The figure agreed'}
          unit={currency}
          value={amount}
          onChangeText={setAmount}
          error={error}
          inputMode="decimal"
          keyboardType="decimal-pad"
          testID="offer-answer-amount"
        />
      ) : null}
      <TextField label="Note (optional)" value={note} onChangeText={setNote} maxLength={300} testID="offer-answer-note" />
      <View style={styles.buttons}>
        <Button label="Record the answer" onPress={submit} busy={record.busy} testID="offer-answer-save" />
      </View>
      {feedback ? (
        <Notice tone={feedback.tone} testID="offer-answer-feedback">
          {feedback.text}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  head: { gap: SPACE.xxs },
  answers: { gap: SPACE.sm },
  answer: { gap: SPACE.xxs },
  form: { gap: SPACE.md },
  buttons: { flexDirection: 'row' },
});
