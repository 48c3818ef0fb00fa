import { StyleSheet, Text, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { BackgroundWorkPanel } from '@/modules/jobs/ui/background-work-panel';
import { STAGES, STAGE_LABELS, type Stage } from '@/modules/pianos/core/piano';
import { PALETTE, SPACE, STAGE_TONES, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Eyelet } from '@/modules/theme/ui/stage-badge';
import { Section } from '@/modules/theme/ui/section';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { PianoListSection } from './piano-list-section';
import { useStageCounts } from './use-pianos';

/** The manager's home: how many pianos stand in each stage, then the whole stock. */
export function StockScreen() {
  return (
    <Screen
      title="Stock"
      eyebrow="Manager"
      headingTestID="home-heading"
      actions={
        <>
          <Button label="Stock table" href="/stock/table" testID="open-stock-table" />
          <Button label="Charts" variant="secondary" href="/stock/charts" testID="open-stock-charts" />
          <Button label="Pricing rules" variant="secondary" href="/stock/pricing" testID="open-pricing-rules" />
          <Button label="Start a trade-in" variant="secondary" href="/trade-ins/new" testID="start-trade-in" />
        </>
      }
    >
      <BackgroundWorkPanel />
      <Section title="By stage" description="Pick a stage to see its pianos.">
        <StageCounts />
      </Section>
      <Section title="All pianos" description="Newest first.">
        <PianoListSection filter={{ order: 'newest' }} emptyTitle="No pianos yet" emptyText="Pianos appear here as soon as intake takes one in." testID="stock-list" />
      </Section>
    </Screen>
  );
}

function StageCounts() {
  const { counts, error } = useStageCounts();
  const wide = useWide();
  const problem = graphProblem(error);
  if (!counts) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Counting pianos…" />;
  const total = STAGES.reduce((sum, s) => sum + counts[s], 0);
  return (
    <View style={styles.grid} role="list" testID="stage-counts">
      {STAGES.map((stage) => (
        <View role="listitem" key={stage} style={[styles.cell, wide ? styles.cellWide : styles.cellPhone]}>
          <StageTile stage={stage} count={counts[stage]} />
        </View>
      ))}
      <View role="listitem" style={[styles.cell, wide ? styles.cellWide : styles.cellPhone]}>
        <View style={[styles.tile, styles.totalTile]}>
          <View style={[styles.strip, styles.totalStrip]}>
            <Eyelet size={8} />
          </View>
          <View style={styles.tileBody}>
            <Text style={[TYPE_SCALE.title, styles.count]}>{total}</Text>
            <Body variant="label" tone="secondary">
              In all
            </Body>
          </View>
        </View>
      </View>
    </View>
  );
}

function StageTile({ stage, count }: { stage: Stage; count: number }) {
  const shown = String(count);
  const tone = STAGE_TONES[stage];
  return (
    <LinkPressable
      href={{ pathname: '/pianos', params: { stage } }}
      testID={`stage-count-${stage}`}
      style={({ hovered }) => [styles.tile, hovered && styles.tileHover]}
    >
      <View style={[styles.strip, { backgroundColor: tone.edge }]}>
        <Eyelet size={8} />
      </View>
      <View style={styles.tileBody}>
        <Text style={[TYPE_SCALE.title, styles.count, count === 0 && styles.countNone]}>{shown}</Text>
        <Body variant="label" tone="secondary">
          {STAGE_LABELS[stage]}
        </Body>
      </View>
    </LinkPressable>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', marginHorizontal: -SPACE.xs },
  cell: { padding: SPACE.xs },
  cellPhone: { width: '50%' },
  cellWide: { width: '16.66%', minWidth: 140 },
  // A stock tag: a coloured strip with its eyelet, then the count and the stage.
  tile: {
    minHeight: 88,
    flexDirection: 'row',
    backgroundColor: PALETTE.vellum,
    borderWidth: 1,
    borderColor: PALETTE.linen,
    borderRadius: 3,
    overflow: 'hidden',
  },
  strip: { width: 18, alignItems: 'center', paddingTop: SPACE.md },
  totalStrip: { backgroundColor: PALETTE.brass },
  tileBody: { flex: 1, paddingHorizontal: SPACE.md, paddingVertical: SPACE.sm, justifyContent: 'space-between' },
  tileHover: { backgroundColor: PALETTE.feltMist },
  totalTile: { backgroundColor: PALETTE.ivory },
  count: { color: PALETTE.ebony },
  countNone: { color: PALETTE.pinGrey },
});
