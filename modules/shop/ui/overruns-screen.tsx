import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { Pager } from '@/modules/theme/ui/pager';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { rowTable, TableHead } from '@/modules/theme/ui/row-table';
import { Screen } from '@/modules/theme/ui/screen';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { VarianceTag } from './components/variance-tag';
import { OVERRUNS_PAGE, useOverruns, type Overrun } from './use-overruns';
import { money } from './work-format';

const COLS = [
  { key: 'piano', label: 'Piano', flex: 1.4 },
  { key: 'over', label: 'Over by', flex: 1.6 },
  { key: 'items', label: 'Items over their estimate', flex: 3 },
  { key: 'cost', label: 'Estimate / cost so far', flex: 2 },
] as const;

/** Pianos whose workshop items have cost more than their estimates, worst first. */
export function OverrunsScreen() {
  return (
    <AbilityGate ability="planWork" title="Workshop overruns">
      <Overruns />
    </AbilityGate>
  );
}

function Overruns() {
  const wide = useWide();
  const [offset, setOffset] = useState(0);
  const { overruns, total, fetching, error } = useOverruns(offset);
  // A page that emptied (work was re-estimated meanwhile) goes back to the worst.
  if (overruns && !overruns.length && offset > 0) setOffset(0);
  const problem = graphProblem(error);
  return (
    <Screen
      title="Workshop overruns"
      eyebrow="Workshop"
      headingTestID="overruns-heading"
      actions={
        <>
          <Button label="Rate card" variant="secondary" href="/workshop/rates" />
          <Button label="Workshop" variant="secondary" href="/workshop" />
        </>
      }
    >
      <Body tone="secondary">
        An overrun is what items have cost beyond their own estimates, labour at the plan’s rate plus parts. Items not started do not offset it. Worst first.
      </Body>
      {!overruns ? (
        problem ? (
          <Notice tone="error">{problem.message}</Notice>
        ) : (
          <Loading label="Loading the overruns…" />
        )
      ) : !overruns.length ? (
        <EmptyState title="No overruns" testID="overruns-empty">
          Every item so far has cost no more than its estimate.
        </EmptyState>
      ) : (
        <View style={styles.listWrap}>
          <Pager offset={offset} shown={overruns.length} total={total} pageSize={OVERRUNS_PAGE} onOffset={setOffset} noun="pianos" busy={fetching} testID="overruns-pager" />
          <View style={wide ? rowTable.table : undefined} testID="overruns-list">
            {wide ? <TableHead columns={COLS} /> : null}
            <View role="list" style={wide ? undefined : rowTable.cards}>
              {overruns.map((o, i) => (
                <View role="listitem" key={o.pianoId}>
                  <LinkPressable
                    href={`/workshop/pianos/${o.pianoId}`}
                    testID={`overrun-${o.pianoId}`}
                    insetFocus={wide}
                    style={({ hovered }) => [wide ? [rowTable.row, styles.row] : rowTable.card, wide && i > 0 && rowTable.rule, hovered && rowTable.hover]}
                  >
                    {wide ? <WideRow o={o} /> : <PhoneCard o={o} />}
                  </LinkPressable>
                </View>
              ))}
            </View>
          </View>
        </View>
      )}
    </Screen>
  );
}

function WideRow({ o }: { o: Overrun }) {
  return (
    <>
      <View style={{ flex: COLS[0].flex, gap: SPACE.xs }}>
        <Body variant="bodyStrong">{o.stockNumber}</Body>
        <StageBadge stage={o.stage} />
      </View>
      <View style={{ flex: COLS[1].flex }}>
        <VarianceTag varianceMinor={o.overrunMinor} currency={o.currency} />
      </View>
      <Body style={{ flex: COLS[2].flex }}>{o.itemsOver.join(', ')}</Body>
      <View style={{ flex: COLS[3].flex }}>
        <Body>{money(o.estimatedCostMinor, o.currency)}</Body>
        <Body tone="secondary">{money(o.actualCostMinor, o.currency)}</Body>
      </View>
    </>
  );
}

function PhoneCard({ o }: { o: Overrun }) {
  return (
    <>
      <View style={styles.cardTop}>
        <Body variant="bodyStrong">{o.stockNumber}</Body>
        <StageBadge stage={o.stage} />
      </View>
      <VarianceTag varianceMinor={o.overrunMinor} currency={o.currency} />
      <Body>{o.itemsOver.join(', ')}</Body>
      <Body variant="small" tone="secondary">
        Estimate {money(o.estimatedCostMinor, o.currency)} · cost so far {money(o.actualCostMinor, o.currency)}
      </Body>
    </>
  );
}

const styles = StyleSheet.create({
  listWrap: { gap: SPACE.md },
  row: { minHeight: 64 },
  cardTop: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
});
