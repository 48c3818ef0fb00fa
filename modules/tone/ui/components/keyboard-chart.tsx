import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { keyboardChartLayout, type ChartKey } from '@/modules/tone/core/chart-layout';
import { keyName, signedCents } from '@/modules/tone/core/pitch';
import { FONT_FAMILIES, PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Body } from '@/modules/theme/ui/text';

export interface KeyboardChartKey extends ChartKey {
  /** dB, shown in the table when given */
  levelDb?: number;
}

interface KeyboardChartProps {
  keys: readonly KeyboardChartKey[];
  /** what the chart is of, for its caption and the table's name */
  title?: string;
  height?: number;
  testID?: string;
}

/** A signed number to one decimal with a real minus sign: "+3.2", "−25.0". */
export const signed = (n: number) => `${n > 0 ? '+' : n < 0 ? '−' : ''}${Math.abs(n).toFixed(1)}`;

/**
 * Cents from equal temperament for each key heard, across the keyboard from A0 to C8. Shape carries the meaning as well
 * as colour (a dot for a key, a diamond for one that stands out, an arrow for one past the chart's edge), and the same
 * numbers are a table for screen readers (and on screen with "Show the numbers").
 */
export function KeyboardChart({ keys, title = 'Pitch by key', height = 180, testID = 'keyboard-chart' }: KeyboardChartProps) {
  const [width, setWidth] = useState(340);
  const [showTable, setShowTable] = useState(false);
  const layout = keyboardChartLayout(keys, width, height);
  const onLayout = (e: LayoutChangeEvent) => {
    const w = Math.round(e.nativeEvent.layout.width);
    if (w > 0 && w !== width) setWidth(w);
  };
  const r = Math.max(2.5, Math.min(4, layout.keyWidth * 0.45));
  return (
    <View style={styles.wrap} testID={testID}>
      <View onLayout={onLayout} aria-hidden importantForAccessibility="no-hide-descendants" accessibilityElementsHidden style={styles.chart}>
        <Svg width={width} height={height} testID={`${testID}-svg`}>
          <Rect x={layout.left} y={layout.top} width={layout.right - layout.left} height={layout.bottom - layout.top} fill={PALETTE.vellum} stroke={PALETTE.linen} />
          {layout.ticks.map((t) => (
            <G key={t.cents}>
              <Line x1={layout.left} x2={layout.right} y1={t.y} y2={t.y} stroke={t.cents === 0 ? PALETTE.walnut : PALETTE.linen} strokeWidth={t.cents === 0 ? 1.5 : 1} strokeDasharray={t.cents === 0 ? undefined : '3 3'} />
              <SvgText x={layout.left - 4} y={t.y + 4} fontSize={11} fontFamily={FONT_FAMILIES.body} fill={PALETTE.walnut} textAnchor="end">
                {t.label}
              </SvgText>
            </G>
          ))}
          {layout.octaves.map((o) => (
            <G key={o.key}>
              <Line x1={o.x} x2={o.x} y1={layout.bottom} y2={layout.bottom + 4} stroke={PALETTE.walnut} />
              <SvgText x={o.x} y={layout.bottom + 16} fontSize={11} fontFamily={FONT_FAMILIES.body} fill={PALETTE.walnut} textAnchor="middle">
                {o.label}
              </SvgText>
            </G>
          ))}
          {layout.marks.map((m) => (
            <G key={m.key}>
              <Line x1={m.x} x2={m.x} y1={layout.zeroY} y2={m.y} stroke={m.standOut ? PALETTE.rosewood : PALETTE.felt} strokeWidth={1.5} />
              {m.clipped ? (
                <Path
                  d={m.clipped === 'above' ? `M ${m.x} ${m.y - 2} l ${r + 1} ${2 * r} l ${-2 * r - 2} 0 Z` : `M ${m.x} ${m.y + 2} l ${r + 1} ${-2 * r} l ${-2 * r - 2} 0 Z`}
                  fill={m.standOut ? PALETTE.rosewood : PALETTE.felt}
                />
              ) : m.standOut ? (
                <Path d={`M ${m.x} ${m.y - r - 2} l ${r + 2} ${r + 2} l ${-r - 2} ${r + 2} l ${-r - 2} ${-r - 2} Z`} fill={PALETTE.vellum} stroke={PALETTE.rosewood} strokeWidth={2} />
              ) : (
                <Circle cx={m.x} cy={m.y} r={r} fill={PALETTE.felt} />
              )}
              {m.standOut ? (
                <SvgText x={m.x} y={m.cents >= 0 ? Math.max(layout.top + 10, m.y - r - 6) : Math.min(layout.bottom - 4, m.y + r + 14)} fontSize={11} fontFamily={FONT_FAMILIES.bodyStrong} fill={PALETTE.rosewood} textAnchor="middle">
                  {m.key}
                </SvgText>
              ) : null}
            </G>
          ))}
        </Svg>
      </View>
      <Body variant="small" tone="secondary" testID={`${testID}-legend`}>
        Cents from equal temperament at A4 = 440 Hz, keys A0 to C8 left to right; scale ±{layout.rangeCents} cents. ● a key heard · ◇ with its key number: a note that stands out · ▲ ▼ beyond the scale.
      </Body>
      <View style={styles.left}>
        <Button
          label={showTable ? 'Hide the numbers' : `Show the numbers (${keys.length} ${keys.length === 1 ? 'key' : 'keys'})`}
          variant="quiet"
          onPress={() => setShowTable((s) => !s)}
          testID={`${testID}-toggle`}
          accessibilityHint="The table is always there for screen readers; this shows it on screen."
        />
      </View>
      <View style={showTable ? styles.table : styles.visuallyHidden} role="table" aria-label={`${title}: cents and level for each key heard`} testID={`${testID}-table`}>
        <View style={[styles.row, styles.headRow]} role="row">
          {['Key', 'Note', 'Cents', 'Level (dB)', ''].map((h) => (
            <View key={h || 'flag'} style={h === '' ? styles.flagCell : styles.cell} role="columnheader">
              <Body variant="label">{h || 'Stands out'}</Body>
            </View>
          ))}
        </View>
        {keys.map((k) => (
          <View key={k.key} style={styles.row} role="row" testID={`${testID}-row-${k.key}`}>
            <View style={styles.cell} role="cell">
              <Body variant="small">{k.key}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{keyName(k.key)}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{signedCents(k.cents)}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{k.levelDb != null ? signed(k.levelDb) : '—'}</Body>
            </View>
            <View style={styles.flagCell} role="cell">
              <Body variant="small">{k.standOut ? 'yes' : ''}</Body>
            </View>
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
  flagCell: { flex: 1.2, minWidth: 0 },
});
