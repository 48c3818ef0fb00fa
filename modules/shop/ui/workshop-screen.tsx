import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useCan } from '@/modules/accounts/ui/use-can';
import type { Stage } from '@/modules/pianos/core/piano';
import { makerAndModel } from '@/modules/pianos/ui/piano-format';
import { usePianos } from '@/modules/pianos/ui/use-pianos';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { AbilityGate } from '@/modules/accounts/ui/ability-gate';

import { useIdleInWorkshop } from './use-shop-profile';
import { formatDate } from './work-format';

/** The workshop at a glance: pianos waiting for a decision, pianos in the workshop, and the way to rates, overruns and climate. */
export function WorkshopScreen() {
  return (
    <AbilityGate ability="workAtBench" title="Workshop">
      <Workshop />
    </AbilityGate>
  );
}

/** Pianos sitting in the workshop past the shop's idle days with nothing planned: a manager's to-do. */
function IdleNotice() {
  const { idle } = useIdleInWorkshop();
  if (!idle?.pianos.length) return null;
  const n = idle.pianos.length;
  return (
    <Notice tone="caution" title={`${n} ${n === 1 ? 'piano has' : 'pianos have'} been in the workshop over ${idle.idleDays} days with no work items`} testID="workshop-idle">
      <View style={styles.idleList}>
        {idle.pianos.map((p) => (
          <Button key={p.pianoId} label={`${p.stockNumber}, ${makerAndModel(p.maker, p.model)}: ${p.days} days`} variant="quiet" href={`/workshop/pianos/${p.pianoId}`} testID={`workshop-idle-${p.pianoId}`} />
        ))}
      </View>
      <Body variant="small">Plan their work or move them on. The number of days is set under Shop details and texts.</Body>
    </Notice>
  );
}

function Workshop() {
  const can = useCan();
  return (
    <Screen
      title="Workshop"
      eyebrow="Workshop"
      headingTestID="workshop-home-heading"
      actions={
        <>
          <Button label="Bench" variant="secondary" href="/bench" />
          {can('planWork') ? <Button label="Overruns" variant="secondary" href="/workshop/overruns" testID="workshop-overruns" /> : null}
          {can('setRates') ? <Button label="Rate card" variant="secondary" href="/workshop/rates" testID="workshop-rates" /> : null}
          {can('setGradeRules') ? <Button label="Grading rules" variant="secondary" href="/workshop/grading" testID="workshop-grading" /> : null}
          {can('editShopTexts') ? <Button label="Disclosure texts" variant="secondary" href="/present/texts" testID="workshop-texts" /> : null}
          <Button label="Climate" variant="secondary" href="/workshop/climate" testID="workshop-climate" />
        </>
      }
    >
      {can('seeIdleWorkshop') ? <IdleNotice /> : null}
      {can('decidePianos') ? (
        <Section title="Waiting for a decision" description="Assessed pianos: recondition, sell as they stand, wholesale or decline. Longest waiting first.">
          <StageList stage="assessed" empty="No assessed piano is waiting." testID="workshop-assessed" />
        </Section>
      ) : null}
      <Section title="In the workshop" description="Longest in the workshop first.">
        <StageList stage="in_workshop" empty="No piano is in the workshop." testID="workshop-in" />
      </Section>
    </Screen>
  );
}

function StageList({ stage, empty, testID }: { stage: Stage; empty: string; testID: string }) {
  const wide = useWide();
  const { pianos, error } = usePianos({ stage, order: 'longestInStage' });
  const problem = graphProblem(error);
  if (!pianos) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading />;
  if (!pianos.length) return <EmptyState title={empty} />;
  return (
    <View role="list" style={[styles.list, wide && styles.listWide]} testID={testID}>
      {pianos.map((p) => (
        <View role="listitem" key={p.id} style={wide ? styles.cellWide : undefined}>
          <LinkPressable
            href={`/workshop/pianos/${p.id}`}
            testID={`${testID}-${p.id}`}
            style={({ hovered }) => [styles.card, hovered && styles.hover]}
          >
            <View style={styles.top}>
              <Body variant="bodyStrong">{p.stockNumber}</Body>
              <StageBadge stage={p.stage} />
            </View>
            <Body>{makerAndModel(p.maker, p.model)}</Body>
            <Body variant="small" tone="quiet">
              Since {formatDate(p.stageChangedAt)}
            </Body>
          </LinkPressable>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  idleList: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.xs },
  list: { gap: SPACE.sm },
  listWide: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md },
  cellWide: { flexBasis: '31%', flexGrow: 1, maxWidth: '33%' },
  card: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, padding: SPACE.lg, gap: SPACE.xs },
  hover: { backgroundColor: PALETTE.feltMist },
  top: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
});
