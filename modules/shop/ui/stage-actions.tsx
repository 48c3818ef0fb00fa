import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSession } from '@/modules/accounts/ui/use-session';
import type { Stage } from '@/modules/pianos/core/piano';
import { MOVES, movesFrom, type StageAction } from '@/modules/pianos/core/stage-machine';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { Feedback, type FeedbackState } from './components/feedback';
import { useMovePiano } from './use-stage-history';

// Moves that need more than a button: the intake form, the plan approval with its items, the workshop's finish checks.
const OWN_FLOW: Partial<Record<StageAction, string>> = {
  submit_assessment: 'the assessment form',
  approve_plan: 'the workshop page',
  finish_workshop: 'the workshop page',
};

interface StageActionsProps {
  pianoId: number;
  stage: Stage;
  /** called after a move went through, with the new stage */
  onMoved?: (stage: Stage) => void;
  /** say where the moves without a button are made (off on the page that makes them) */
  showElsewhere?: boolean;
  testID?: string;
}

/** The stage moves the signed-in role can make from here (put on the floor, record the sale...), each with an optional reason. */
export function StageActions({ pianoId, stage, onMoved, showElsewhere = true, testID = 'stage-actions' }: StageActionsProps) {
  const { user } = useSession();
  const move = useMovePiano();
  const [chosen, setChosen] = useState<StageAction | null>(null);
  const [why, setWhy] = useState('');
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  if (!user) return null;
  const actions = movesFrom(stage, user.role).filter((a) => !OWN_FLOW[a]);
  if (!actions.length) return null;

  const confirm = async () => {
    if (!chosen) return;
    const outcome = await move.run({ pianoId, action: chosen, why: why.trim() || null });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setFeedback({ tone: 'success', text: `Done: ${MOVES[chosen].label.toLowerCase()}.` });
    setChosen(null);
    setWhy('');
    onMoved?.(outcome.data.stage);
  };

  return (
    <View style={styles.wrap} testID={testID}>
      <View style={styles.buttons}>
        {actions.map((a) => (
          <Button
            key={a}
            label={MOVES[a].label}
            variant={chosen === a ? 'primary' : 'secondary'}
            onPress={() => {
              setFeedback(null);
              setChosen(chosen === a ? null : a);
            }}
            testID={`${testID}-${a}`}
          />
        ))}
      </View>
      {chosen ? (
        <View style={styles.confirm}>
          <TextField label="Reason" hint="Optional: kept in the piano’s history." value={why} onChangeText={setWhy} maxLength={500} testID={`${testID}-why`} />
          <View style={styles.buttons}>
            <Button label={`Confirm: ${MOVES[chosen].label.toLowerCase()}`} onPress={confirm} busy={move.busy} testID={`${testID}-confirm`} />
            <Button label="Cancel" variant="quiet" onPress={() => setChosen(null)} />
          </View>
        </View>
      ) : null}
      <Feedback state={feedback} testID={`${testID}-feedback`} />
      {showElsewhere && movesFrom(stage, user.role).some((a) => OWN_FLOW[a]) ? (
        <Body variant="small" tone="quiet">
          {movesFrom(stage, user.role)
            .filter((a) => OWN_FLOW[a])
            .map((a) => `${MOVES[a].label}: on ${OWN_FLOW[a]}.`)
            .join(' ')}
        </Body>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  confirm: { gap: SPACE.sm },
});
