import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { ROLE_LABELS, isRole } from '@/modules/accounts/core/roles';
import { STAGE_LABELS } from '@/modules/pianos/core/piano';
import { daysInStages } from '@/modules/pianos/core/stage-machine';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';

import { useStageHistory, type StageMoveView } from './use-stage-history';
import { formatWhen } from './work-format';

const days = (n: number) => (n === 1 ? '1 day' : `${n} days`);

function who(m: StageMoveView): string {
  if (m.byRole === 'system') return 'Feltwire';
  const role = isRole(m.byRole) ? ROLE_LABELS[m.byRole].toLowerCase() : null;
  if (m.by && role) return `${m.by} (${role})`;
  return m.by ?? (role ? `the ${role}` : 'someone');
}

/**
 * A piano's road through the stages, oldest first: each move with who made it, when and why, and the
 * whole days the piano spent in the stage it arrived at (the last one up to now).
 */
export function StageTimeline({ pianoId, testID = 'stage-timeline' }: { pianoId: number; testID?: string }) {
  const { moves, error } = useStageHistory(pianoId);
  const problem = graphProblem(error);
  if (!moves) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the stage history…" />;
  if (!moves.length) return <Body tone="secondary">No stage moves recorded yet.</Body>;
  const stays = daysInStages(moves, new Date());
  return (
    <View role="list" style={styles.list} testID={testID}>
      {moves.map((m, i) => {
        const last = i === moves.length - 1;
        return (
          <View role="listitem" key={`${m.at}-${i}`} style={styles.item} testID={`${testID}-move-${i}`}>
            <View aria-hidden style={styles.rail}>
              <View style={[styles.node, last && styles.nodeNow]} />
              {!last ? <View style={styles.line} /> : null}
            </View>
            <View style={styles.body}>
              <View style={styles.head}>
                {m.fromStage ? (
                  <>
                    <Body variant="small" tone="secondary">
                      {STAGE_LABELS[m.fromStage]} →
                    </Body>
                    <StageBadge stage={m.toStage} />
                  </>
                ) : (
                  <>
                    <Body variant="small" tone="secondary">
                      Arrived:
                    </Body>
                    <StageBadge stage={m.toStage} />
                  </>
                )}
              </View>
              <Body variant="small" tone="secondary">
                {formatWhen(m.at)} · {who(m)}
              </Body>
              {m.why ? <Body>“{m.why}”</Body> : null}
              <Body variant="label" tone={last ? 'default' : 'quiet'}>
                {last ? `${days(stays[i].days)} in this stage so far` : `${days(stays[i].days)} in this stage`}
              </Body>
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  item: { flexDirection: 'row', gap: SPACE.md },
  rail: { width: 16, alignItems: 'center' },
  node: { width: 12, height: 12, borderRadius: RADIUS.pill, borderWidth: 2, borderColor: PALETTE.felt, backgroundColor: PALETTE.vellum, marginTop: 6 },
  nodeNow: { backgroundColor: PALETTE.felt },
  line: { flex: 1, width: 2, backgroundColor: PALETTE.linenDark, marginVertical: 2 },
  body: { flex: 1, gap: SPACE.xxs, paddingBottom: SPACE.lg, minWidth: 0 },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
});
