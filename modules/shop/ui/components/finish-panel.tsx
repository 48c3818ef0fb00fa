import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Body, Heading } from '@/modules/theme/ui/text';

import { Feedback, type FeedbackState } from './feedback';

interface FinishPanelProps {
  itemsOpen: number;
  itemsTotal: number;
  remeasured: boolean;
  busy: boolean;
  onFinish: () => Promise<FeedbackState>;
}

function Check({ ok, text }: { ok: boolean; text: string }) {
  return (
    <View style={styles.check}>
      <View aria-hidden style={[styles.box, ok && styles.boxOk]}>
        {ok ? <View style={styles.tick} /> : null}
      </View>
      <Body tone={ok ? 'default' : 'secondary'}>
        {ok ? 'Yes: ' : 'Not yet: '}
        {text}
      </Body>
    </View>
  );
}

/** The piano leaves the workshop when every item is done and it has been re-measured since the plan was approved. */
export function FinishPanel({ itemsOpen, itemsTotal, remeasured, busy, onFinish }: FinishPanelProps) {
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  return (
    <Card role="region" accessibilityLabel="Finish in the workshop">
      <Heading level={2}>Finish in the workshop</Heading>
      <Check
        ok={itemsTotal > 0 && itemsOpen === 0}
        text={!itemsTotal ? 'the plan has no work items' : itemsOpen ? `every work item done (${itemsOpen} of ${itemsTotal} still open)` : 'every work item done'}
      />
      <Check ok={remeasured} text="re-measured after the work" />
      <Body variant="small" tone="quiet">
        The piano then moves to ready, for the floor.
      </Body>
      <View style={styles.start}>
        <Button label="Finish in the workshop" onPress={async () => setFeedback(await onFinish())} busy={busy} testID="finish-workshop" />
      </View>
      <Feedback state={feedback} testID="finish-feedback" />
    </Card>
  );
}

const styles = StyleSheet.create({
  start: { alignItems: 'flex-start' },
  check: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm },
  box: { width: 22, height: 22, borderRadius: RADIUS.sm, borderWidth: 2, borderColor: PALETTE.linenDark, alignItems: 'center', justifyContent: 'center' },
  boxOk: { backgroundColor: PALETTE.moss, borderColor: PALETTE.moss },
  tick: { width: 6, height: 11, borderColor: PALETTE.vellum, borderRightWidth: 2.5, borderBottomWidth: 2.5, transform: [{ rotate: '45deg' }], marginTop: -2 },
});
