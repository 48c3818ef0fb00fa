import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

// A list that is a table on a wide window and stacked cards on a phone: the look its screens share.

export interface TableColumn {
  key: string;
  label: string;
  flex: number;
  /** Room a column keeps however narrow the table gets (a button on one line). */
  minWidth?: number;
}

export const rowTable = StyleSheet.create({
  table: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.md, minHeight: 56 },
  rule: { borderTopWidth: 1, borderTopColor: PALETTE.linen },
  hover: { backgroundColor: PALETTE.feltMist },
  cards: { gap: SPACE.sm },
  card: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, padding: SPACE.lg, gap: SPACE.sm },
  headRow: { backgroundColor: PALETTE.ivory, borderBottomWidth: 2, borderBottomColor: PALETTE.linen, minHeight: 44, paddingVertical: SPACE.sm },
  head: { color: PALETTE.walnut },
});

/** The wide table's header row; hidden from screen readers, since each row names its own fields. */
export function TableHead({ columns, labelOf }: { columns: readonly TableColumn[]; labelOf?: (c: TableColumn) => string }) {
  return (
    <View aria-hidden style={[rowTable.row, rowTable.headRow]}>
      {columns.map((c) => (
        <Text key={c.key} style={[TYPE_SCALE.label, rowTable.head, { flex: c.flex }, c.minWidth != null && { minWidth: c.minWidth }]}>
          {labelOf ? labelOf(c) : c.label}
        </Text>
      ))}
    </View>
  );
}
