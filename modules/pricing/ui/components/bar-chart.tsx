import { scaleBand, scaleLinear } from 'd3-scale';
import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Defs, G, Line, Path, Pattern, Rect, Text as SvgText } from 'react-native-svg';

import { FONT_FAMILIES, PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Body } from '@/modules/theme/ui/text';

/** One series of bars: drawn solid or hatched, so two series differ by more than their colour. */
export interface BarSeries {
  name: string;
  look: 'solid' | 'hatched';
}

export interface BarRow {
  key: string;
  label: string;
  /** one value per series, with the words printed at the bar's end and in the table */
  values: { value: number; text: string }[];
}

interface BarChartProps {
  title: string;
  series: BarSeries[];
  rows: BarRow[];
  /** the table's first column heading */
  rowHeading: string;
  testID: string;
}

const ROW = 30;
const GAP = 10;

/**
 * Horizontal bars with their label at the left and their number at the bar's end, so each is read without
 * colour; a second series is hatched. The same numbers are a table for screen readers, and on screen on request.
 */
export function BarChart({ title, series, rows, rowHeading, testID }: BarChartProps) {
  const [width, setWidth] = useState(340);
  const [showTable, setShowTable] = useState(false);
  const onLayout = (e: LayoutChangeEvent) => {
    const w = Math.round(e.nativeEvent.layout.width);
    if (w > 0 && w !== width) setWidth(w);
  };
  // On a phone each label sits above its bars, so neither is cut short.
  const stacked = width < 480;
  const labelWidth = stacked ? 0 : Math.min(200, Math.round(width * 0.38));
  const labelRoom = stacked ? 18 : 0;
  // Room at the bar's end for its number (and the series' name when there are two).
  const valueRoom = series.length > 1 ? 150 : 104;
  const values = rows.flatMap((r) => r.values.map((v) => v.value));
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values, 1);
  const x = scaleLinear().domain([lo, hi]).range([labelWidth + (lo < 0 ? valueRoom : 0), width - valueRoom]).nice();
  const band = labelRoom + ROW * series.length + GAP;
  const height = rows.length * band + 8;
  const y = scaleBand<string>().domain(rows.map((r) => r.key)).range([4, height - 4]).paddingInner(0);
  const zero = x(0);
  const hatchId = `${testID}-hatch`;

  return (
    <View style={styles.wrap} testID={testID}>
      <View onLayout={onLayout} aria-hidden importantForAccessibility="no-hide-descendants" accessibilityElementsHidden style={styles.chart}>
        <Svg width={width} height={height} testID={`${testID}-svg`}>
          <Defs>
            <Pattern id={hatchId} patternUnits="userSpaceOnUse" width={6} height={6}>
              <Rect width={6} height={6} fill={PALETTE.vellum} />
              <Path d="M0 6 L6 0 M-1 1 L1 -1 M5 7 L7 5" stroke={PALETTE.brassShade} strokeWidth={1.5} />
            </Pattern>
          </Defs>
          {rows.map((r) => {
            const top = y(r.key) ?? 0;
            return (
              <G key={r.key}>
                <SvgText x={stacked ? 0 : labelWidth - 8} y={stacked ? top + 13 : top + (ROW * series.length) / 2 + 4} fontSize={12} fontFamily={FONT_FAMILIES.body} fill={PALETTE.ebony} textAnchor={stacked ? 'start' : 'end'}>
                  {r.label.length > (stacked ? 48 : 28) ? `${r.label.slice(0, stacked ? 47 : 27)}…` : r.label}
                </SvgText>
                {r.values.map((v, n) => {
                  const barTop = top + labelRoom + n * ROW + 4;
                  const end = x(v.value);
                  const left = Math.min(zero, end);
                  const w = Math.max(1, Math.abs(end - zero));
                  const look = series[n]?.look ?? 'solid';
                  return (
                    <G key={n}>
                      <Rect x={left} y={barTop} width={w} height={ROW - 8} fill={look === 'solid' ? PALETTE.felt : `url(#${hatchId})`} stroke={look === 'solid' ? PALETTE.felt : PALETTE.brassShade} strokeWidth={1} />
                      <SvgText x={v.value < 0 ? left - 6 : left + w + 6} y={barTop + ROW / 2} fontSize={12} fontFamily={FONT_FAMILIES.bodyStrong} fill={PALETTE.ebony} textAnchor={v.value < 0 ? 'end' : 'start'}>
                        {series.length > 1 ? `${v.text} ${series[n].name.toLowerCase()}` : v.text}
                      </SvgText>
                    </G>
                  );
                })}
              </G>
            );
          })}
          <Line x1={zero} x2={zero} y1={0} y2={height} stroke={PALETTE.walnut} strokeWidth={1} />
        </Svg>
      </View>
      {series.length > 1 ? (
        <Body variant="small" tone="secondary" testID={`${testID}-legend`}>
          {series.map((s) => `${s.look === 'solid' ? '■ solid' : '▨ hatched'}: ${s.name.toLowerCase()}`).join(' · ')}
        </Body>
      ) : null}
      <View style={styles.left}>
        <Button
          label={showTable ? 'Hide the numbers' : 'Show the numbers'}
          variant="quiet"
          onPress={() => setShowTable((s) => !s)}
          testID={`${testID}-toggle`}
          accessibilityHint="The table is always there for screen readers; this shows it on screen."
        />
      </View>
      <View style={showTable ? styles.table : styles.visuallyHidden} role="table" aria-label={`${title}, as numbers`} testID={`${testID}-table`}>
        <View style={[styles.row, styles.headRow]} role="row">
          {[rowHeading, ...series.map((s) => s.name)].map((h) => (
            <View key={h} style={styles.cell} role="columnheader">
              <Body variant="label">{h}</Body>
            </View>
          ))}
        </View>
        {rows.map((r) => (
          <View key={r.key} style={styles.row} role="row" testID={`${testID}-row`}>
            <View style={styles.cell} role="cell">
              <Body variant="small">{r.label}</Body>
            </View>
            {r.values.map((v, n) => (
              <View key={n} style={styles.cell} role="cell">
                <Body variant="small">{v.text}</Body>
              </View>
            ))}
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.sm },
  chart: { width: '100%' },
  left: { alignItems: 'flex-start' },
  table: { borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.md, overflow: 'hidden' },
  // Read by screen readers, not drawn: the chart above shows the same numbers.
  visuallyHidden: { position: 'absolute', width: 1, height: 1, overflow: 'hidden', opacity: 0 },
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingHorizontal: SPACE.sm, paddingVertical: SPACE.xxs },
  headRow: { borderTopWidth: 0, backgroundColor: PALETTE.feltMist },
  cell: { flex: 1, minWidth: 0 },
});
