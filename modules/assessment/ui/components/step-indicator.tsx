import { Pressable, StyleSheet, Text, View } from 'react-native';

import { STEP_TITLES, type StepKey } from '@/modules/assessment/ui/intake-draft';
import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface StepIndicatorProps {
  steps: readonly StepKey[];
  current: StepKey;
  /** index of the furthest step reached: steps up to it can be opened */
  furthest: number;
  /** steps holding a problem the user has been shown */
  withProblems: ReadonlySet<StepKey>;
  onJump: (step: StepKey) => void;
  /** show each step's name under its number (wide screens) */
  showNames?: boolean;
}

/** "n of 8" as a row of numbered stops: done, here, or not reached yet; a reached stop opens its step. */
export function StepIndicator({ steps, current, furthest, withProblems, onJump, showNames }: StepIndicatorProps) {
  const here = steps.indexOf(current);
  return (
    <View role="list" aria-label={`Step ${here + 1} of ${steps.length}`} style={styles.row} testID="step-indicator">
      {steps.map((step, i) => {
        const reachable = i <= furthest && step !== current;
        const state = step === current ? 'here' : i <= furthest ? 'done' : 'ahead';
        const problem = withProblems.has(step);
        return (
          <View role="listitem" key={step} style={styles.item}>
            <Pressable
              role="button"
              disabled={!reachable}
              aria-disabled={!reachable || undefined}
              aria-current={step === current ? 'step' : undefined}
              onPress={() => onJump(step)}
              testID={`step-jump-${step}`}
              style={styles.hit}
            >
              <View style={[styles.bar, state !== 'ahead' && styles.barDone]} />
              <View style={[styles.dot, state === 'done' && styles.dotDone, state === 'here' && styles.dotHere, problem && styles.dotProblem]}>
                <Text style={[TYPE_SCALE.badge, state === 'done' ? styles.numDone : state === 'here' ? styles.numHere : styles.numAhead, problem && styles.numProblem]}>
                  {problem ? '!' : i + 1}
                </Text>
              </View>
              {showNames ? (
                <Text numberOfLines={2} style={[TYPE_SCALE.badge, styles.name, step === current && styles.nameHere]}>
                  {STEP_TITLES[step]}
                </Text>
              ) : null}
              {/* Said after what is shown, so the spoken name starts with the visible one (WCAG 2.5.3). */}
              <Text style={styles.unseen}>{`${showNames ? '' : ` ${STEP_TITLES[step]}`}, step ${i + 1} of ${steps.length}${state === 'done' ? ', reached' : state === 'ahead' ? ', not reached yet' : ', this step'}${problem ? ', needs a look' : ''}`}</Text>
            </Pressable>
          </View>
        );
      })}
    </View>
  );
}

const DOT = 30;

const styles = StyleSheet.create({
  unseen: { position: 'absolute', width: 1, height: 1, overflow: 'hidden', opacity: 0 },
  row: { flexDirection: 'row' },
  item: { flex: 1, minWidth: 0 },
  hit: { minHeight: LAYOUT.touchTarget, alignItems: 'center', justifyContent: 'flex-start', paddingTop: SPACE.xs, gap: SPACE.xs },
  bar: { position: 'absolute', top: SPACE.xs + DOT / 2 - 1, left: 0, right: 0, height: 2, backgroundColor: PALETTE.linen },
  barDone: { backgroundColor: PALETTE.felt },
  dot: {
    width: DOT,
    height: DOT,
    borderRadius: RADIUS.pill,
    borderWidth: 2,
    borderColor: PALETTE.linenDark,
    backgroundColor: PALETTE.ivory,
    alignItems: 'center',
    justifyContent: 'center',
  },
  dotDone: { backgroundColor: PALETTE.felt, borderColor: PALETTE.felt },
  dotHere: { borderColor: PALETTE.brassShade, borderWidth: 3, backgroundColor: PALETTE.vellum },
  dotProblem: { borderColor: PALETTE.rosewood, backgroundColor: PALETTE.rosewoodBlush },
  numDone: { color: PALETTE.ivory },
  numHere: { color: PALETTE.ebony },
  numAhead: { color: PALETTE.pinGrey },
  numProblem: { color: PALETTE.rosewood },
  name: { color: PALETTE.walnut, textAlign: 'center' },
  nameHere: { color: PALETTE.ebony, fontFamily: TYPE_SCALE.bodyStrong.fontFamily, fontWeight: '600' },
});
