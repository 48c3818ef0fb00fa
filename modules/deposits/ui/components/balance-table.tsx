import { StyleSheet, View } from 'react-native';

import type { Balance } from '@/modules/deposits/core/deposit';
import { money } from '@/modules/disclosure/ui/disclosure-format';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';

/** Price, sales tax, total, less the deposit: the balance due at the sale, figures aligned right. */
export function BalanceTable({ balance, testID }: { balance: Balance; testID?: string }) {
  const m = (minor: number) => money(minor, balance.currency);
  const rows: { label: string; value: string; strong?: boolean }[] = [
    { label: 'Price', value: m(balance.priceMinor) },
    { label: `Sales tax (${balance.salesTaxPct} %)`, value: m(balance.taxMinor) },
    { label: 'Total', value: m(balance.totalMinor) },
    { label: 'Deposit paid', value: balance.depositMinor ? `− ${m(balance.depositMinor)}` : m(0) },
  ];
  return (
    <View role="list" aria-label="Balance due at sale" style={styles.table} testID={testID}>
      {rows.map((r) => (
        <View role="listitem" key={r.label} style={styles.row}>
          <Body style={styles.label} tone="secondary">
            {r.label}
          </Body>
          <Body style={styles.value}>{r.value}</Body>
        </View>
      ))}
      <View role="listitem" style={[styles.row, styles.totalRow]}>
        <Body variant="bodyStrong" style={styles.label}>
          Balance due at sale
        </Body>
        <Body variant="subheading" style={styles.value} testID={testID ? `${testID}-due` : undefined}>
          {m(balance.balanceMinor)}
        </Body>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: 0 },
  row: { flexDirection: 'row', alignItems: 'baseline', justifyContent: 'space-between', gap: SPACE.md, paddingVertical: SPACE.xs + 2, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  totalRow: { borderBottomWidth: 0, borderTopWidth: 2, borderTopColor: PALETTE.ebony, marginTop: -1, paddingTop: SPACE.sm },
  label: { flexShrink: 1 },
  value: { textAlign: 'right', fontVariant: ['tabular-nums'] },
});
