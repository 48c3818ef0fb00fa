import { useState } from 'react';


import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { Feedback, type FeedbackState } from './feedback';
import { Buttons } from './field-row';

interface LogTimeFormProps {
  blocked: string | null;
  busy: boolean;
  onLog: (minutes: number, note: string | null) => Promise<FeedbackState>;
}

const QUICK = ['15', '30', '60', '120'] as const;
const QUICK_LABELS: Record<(typeof QUICK)[number], string> = { 15: '15 min', 30: '30 min', 60: '1 h', 120: '2 h' };

/** Time worked without the timer: whole minutes and a note of what was done. */
export function LogTimeForm({ blocked, busy, onLog }: LogTimeFormProps) {
  const [minutes, setMinutes] = useState('');
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const [open, setOpen] = useState(false);
  const submit = async () => {
    setFeedback(null);
    const n = Number(minutes.trim());
    // Typed as negative is refused, never turned positive: an entry logged by mistake is corrected instead.
    if (Number.isFinite(n) && n < 0) {
      setError('Minutes cannot be negative. To take time off, correct the entry under “Time logged”.');
      return;
    }
    if (!minutes.trim() || !Number.isInteger(n) || n < 1 || n > 1440) {
      setError('Give whole minutes, from 1 to 1440 (24 hours).');
      return;
    }
    setError(null);
    const outcome = await onLog(n, note.trim() || null);
    setFeedback(outcome);
    if (outcome?.tone === 'success') {
      setMinutes('');
      setNote('');
      setOpen(false);
    }
  };
  if (!open) {
    return (
      <Card role="region" accessibilityLabel="Log time by hand">
        <Heading level={2}>Log time by hand</Heading>
        <Button label="Log time worked without the timer" variant="secondary" onPress={() => setOpen(true)} disabled={!!blocked} stretch testID="log-open" />
        <Feedback state={feedback} testID="log-feedback" />
      </Card>
    );
  }
  return (
    <Card role="form" accessibilityLabel="Log time by hand">
      <Heading level={2}>Log time by hand</Heading>
      <TextField
        label="Minutes worked"
        hint="For work done without the timer."
        value={minutes}
        onChangeText={(t) => setMinutes(t.replace(/[^0-9-]/g, ''))}
        unit="min"
        inputMode="numeric"
        keyboardType="numbers-and-punctuation"
        error={error}
        testID="log-minutes"
      />
      <ChoiceGroup label="Or pick" options={QUICK} labels={QUICK_LABELS} value={(QUICK as readonly string[]).includes(minutes) ? (minutes as (typeof QUICK)[number]) : null} onChange={setMinutes} compact testID="log-quick" />
      <TextField label="What was done" hint="Optional, seen by the manager." value={note} onChangeText={setNote} multiline maxLength={500} testID="log-note" />
      <Buttons>
        <Button label="Log the time" onPress={submit} busy={busy} disabled={!!blocked} testID="log-submit" />
        <Button label="Cancel" variant="quiet" onPress={() => setOpen(false)} />
      </Buttons>
      <Feedback state={feedback} testID="log-feedback" />
    </Card>
  );
}

