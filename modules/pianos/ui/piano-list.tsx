import { StyleSheet, View } from 'react-native';

import { SPACE } from '@/modules/theme/core/palette';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { rowTable, TableHead } from '@/modules/theme/ui/row-table';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { formatDay, formatKindAndSize, formatYear, makerAndModel } from './piano-format';
import type { PianoRecord } from './use-pianos';

interface PianoListProps {
  pianos: readonly PianoRecord[];
  /** which date the last column shows */
  dateColumn?: 'received' | 'stageChanged';
  testID?: string;
}

const COLUMNS = [
  { key: 'stock', label: 'Stock no.', flex: 1.1 },
  { key: 'piano', label: 'Maker and model', flex: 2.4 },
  { key: 'size', label: 'Kind and size', flex: 1.9 },
  { key: 'year', label: 'Year', flex: 1.6 },
  { key: 'stage', label: 'Stage', flex: 1.6 },
  { key: 'date', label: '', flex: 1.3 },
] as const;

/** Pianos as a list of links: a table-like grid on a wide window, stacked cards on a phone. */
export function PianoList({ pianos, dateColumn = 'received', testID }: PianoListProps) {
  const wide = useWide();
  const dateLabel = dateColumn === 'received' ? 'Taken in' : 'In stage since';
  const dateOf = (p: PianoRecord) => formatDay(dateColumn === 'received' ? p.createdAt : p.stageChangedAt);
  return (
    <View style={wide ? rowTable.table : undefined} testID={testID}>
      {wide ? <TableHead columns={COLUMNS} labelOf={(c) => (c.key === 'date' ? dateLabel : c.label)} /> : null}
      <View role="list" style={wide ? undefined : rowTable.cards}>
        {pianos.map((p, index) => (
          <View role="listitem" key={p.id}>
            <LinkPressable
              href={`/pianos/${p.id}`}
              testID={`piano-row-${p.id}`}
              insetFocus={wide}
              style={({ hovered }) => [wide ? rowTable.row : [rowTable.card, styles.card], wide && index > 0 && rowTable.rule, hovered && rowTable.hover]}
            >
              {wide ? <WideRow piano={p} date={dateOf(p)} /> : <PhoneCard piano={p} date={`${dateLabel.toLowerCase()} ${dateOf(p)}`} />}
            </LinkPressable>
          </View>
        ))}
      </View>
    </View>
  );
}

function WideRow({ piano: p, date }: { piano: PianoRecord; date: string }) {
  return (
    <>
      <Body variant="bodyStrong" style={{ flex: COLUMNS[0].flex }}>
        {p.stockNumber}
      </Body>
      <Body style={{ flex: COLUMNS[1].flex }} numberOfLines={2}>
        {makerAndModel(p.maker, p.model)}
      </Body>
      <Body tone="secondary" style={{ flex: COLUMNS[2].flex }}>
        {formatKindAndSize(p.kind, p.sizeCm)}
      </Body>
      <Body tone="secondary" style={{ flex: COLUMNS[3].flex }}>
        {formatYear(p)}
      </Body>
      <View style={{ flex: COLUMNS[4].flex }}>
        <StageBadge stage={p.stage} />
      </View>
      <Body tone="quiet" variant="small" style={{ flex: COLUMNS[5].flex }}>
        {date}
      </Body>
    </>
  );
}

function PhoneCard({ piano: p, date }: { piano: PianoRecord; date: string }) {
  return (
    <>
      <View style={styles.cardTop}>
        <Body variant="bodyStrong">{p.stockNumber}</Body>
        <StageBadge stage={p.stage} />
      </View>
      <Body variant="subheading">{makerAndModel(p.maker, p.model)}</Body>
      <Body variant="small" tone="secondary">
        {formatKindAndSize(p.kind, p.sizeCm)} · {formatYear(p)} · {date}
      </Body>
    </>
  );
}

const styles = StyleSheet.create({
  card: { gap: SPACE.xs },
  cardTop: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
});
