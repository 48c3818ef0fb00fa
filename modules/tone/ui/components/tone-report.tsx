import { StyleSheet, View } from 'react-native';

import type { KeyboardReport, StandOutNote } from '@/modules/tone/core/keyboard-report';
import { centsAmount, centsOffset } from '@/modules/tone/core/pitch';
import { CAUTION_FOOTER, CAUTIONS } from '@/modules/shop/core/cautions';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { FactList } from '@/modules/theme/ui/fact-list';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { KeyboardChart, signed } from './keyboard-chart';

const abs1 = (n: number) => Math.abs(n).toFixed(1);

/** "12.4 cents flat", "3 cents sharp", "at pitch": the one cents formatter. */
export const offsetText = (c: number) => centsOffset(c);

function standOutText(s: StandOutNote): string {
  const amount = s.measure === 'pitch' ? centsAmount(s.difference) : `${abs1(s.difference)} dB`;
  return `Key ${s.key} (${s.name}): ${amount} ${s.direction} than its neighbours`;
}

const dbText = (db: number | null) => (db == null ? '—' : `${signed(db)} dB`);

/** What one recording says: the pitch against A4 = 440 Hz, a pitch raise if it needs one, the registers, the notes that stand out, the chart. */
export function ToneReport({ report, testID = 'tone-report' }: { report: KeyboardReport; testID?: string }) {
  const { pitch } = report;
  if (!report.keys.length) {
    return (
      <Notice tone="info" testID={`${testID}-empty`}>
        No notes were heard in this recording. Play each note on its own and let it ring for about a second, with the microphone near the strings.
      </Notice>
    );
  }
  const standOut = new Set(report.standOut.map((s) => s.key));
  return (
    <View style={styles.report} testID={testID}>
      <FactList
        dense
        facts={[
          { label: 'Notes heard', value: `${report.notesHeard} (${report.keys.length} ${report.keys.length === 1 ? 'key' : 'keys'})` },
          { label: 'Pitch overall', value: pitch.overallCents != null ? `${offsetText(pitch.overallCents)} of A4 = 440 Hz (median of the keys heard)` : '—' },
          { label: 'A4', value: pitch.a4Hz != null ? `${pitch.a4Hz.toFixed(1)} Hz (${pitch.a4From === 'key49' ? 'key 49 measured' : 'from the overall pitch; key 49 was not played'})` : '—' },
        ]}
      />
      {pitch.pitchRaiseNeeded ? (
        <Notice tone="caution" title="A pitch raise before fine tuning" testID={`${testID}-pitch-raise`}>
          {`The piano sits ${abs1(pitch.overallCents!)} cents flat overall, more than the shop's ${pitch.pitchRaiseCents} cents: it needs a pitch raise (a rough pass) before a fine tuning. ${CAUTIONS.pitch} ${CAUTION_FOOTER}`}
        </Notice>
      ) : (
        <Body tone="secondary" testID={`${testID}-no-pitch-raise`}>
          No pitch raise needed: not more than {pitch.pitchRaiseCents} cents flat overall (the shop’s rule).
        </Body>
      )}
      <KeyboardChart keys={report.keys.map((k) => ({ key: k.key, cents: k.cents, levelDb: k.levelDb, standOut: standOut.has(k.key) }))} testID={`${testID}-chart`} />
      <View style={styles.registers} role="table" aria-label="Level balance of the registers">
        <View style={[styles.row, styles.head]} role="row">
          {['Register', 'Keys heard', 'Level against the middle', 'Spread key to key', 'Evenness'].map((h) => (
            <View key={h} style={styles.cell} role="columnheader">
              <Body variant="label">{h}</Body>
            </View>
          ))}
        </View>
        {report.registers.map((r) => (
          <View key={r.register} style={styles.row} role="row" testID={`${testID}-register-${r.register}`}>
            <View style={styles.cell} role="cell">
              <Body variant="small">{r.label}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{r.keys}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{r.register === 'middle' ? (r.keys ? 'the reference' : '—') : dbText(r.relativeToMiddleDb)}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{r.levelSpreadDb == null ? '—' : `${r.levelSpreadDb.toFixed(1)} dB`}</Body>
            </View>
            <View style={styles.cell} role="cell">
              <Body variant="small">{r.evenness == null ? 'too few keys' : `${r.evenness} of 5`}</Body>
            </View>
          </View>
        ))}
      </View>
      <Body variant="small" tone="quiet">
        Level only: the recording cannot judge tone colour. Evenness 5 means a spread within 1.5 dB, 4 within 3 dB, 3 within 4.5 dB, 2 within 6 dB (shop defaults).
      </Body>
      <View style={styles.standOut} testID={`${testID}-stand-out`}>
        <Body variant="subheading">Notes that stand out</Body>
        {report.standOut.length ? report.standOut.map((s) => <Body key={`${s.key}-${s.measure}`}>• {standOutText(s)}</Body>) : <Body tone="secondary">None by this rule.</Body>}
        <Body variant="small" tone="quiet">
          {report.standOutRule}
        </Body>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  report: { gap: SPACE.md },
  registers: { borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.md, overflow: 'hidden' },
  row: { flexDirection: 'row', gap: SPACE.xs, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingHorizontal: SPACE.sm, paddingVertical: SPACE.xs },
  head: { borderTopWidth: 0, backgroundColor: PALETTE.feltMist },
  cell: { flex: 1, minWidth: 0 },
  standOut: { gap: SPACE.xs },
});
