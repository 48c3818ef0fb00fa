import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { HUMIDITY_BAND, readClimate } from '@/modules/shop/core/climate';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { Feedback, type FeedbackState } from './components/feedback';
import { FieldRow } from './components/field-row';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { useClimateReadings, useLogClimate, type ClimateReadingView } from './use-climate';
import { formatWhen, parseNumber } from './work-format';

const pct = (n: number) => `${n.toFixed(1)} %`;
const band = `${HUMIDITY_BAND.low}-${HUMIDITY_BAND.high} %`;

/** The workshop's air: log a reading, see the wood's moisture content and whether the air is too dry or damp. */
export function ClimateScreen() {
  return (
    <AbilityGate ability="workAtBench" title="Workshop climate">
      <Climate />
    </AbilityGate>
  );
}

function Climate() {
  const wide = useWide();
  const { readings, error, refresh } = useClimateReadings();
  const problem = graphProblem(error);
  return (
    <Screen title="Workshop climate" eyebrow="Workshop" headingTestID="climate-heading">
      <Body tone="secondary">
        Pianos keep best at {band} relative humidity. Dry air cracks soundboards and loosens tuning pins; damp air swells wood and rusts strings.
      </Body>
      <View style={[styles.columns, !wide && styles.stack]}>
        <View style={wide ? styles.form : undefined}>
          <ReadingForm onLogged={refresh} />
        </View>
        <View style={wide ? styles.list : undefined}>
          <Section title="Recent readings" description="Newest first, with the moisture content the wood settles at in that air.">
            {!readings ? (
              problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the readings…" />
            ) : readings.length ? (
              <View role="list" style={styles.readings} testID="climate-list">
                {readings.map((r) => (
                  <ReadingRow key={r.id} reading={r} />
                ))}
              </View>
            ) : (
              <EmptyState title="No readings yet">Log the first one with a hygrometer by the bench.</EmptyState>
            )}
          </Section>
        </View>
      </View>
    </Screen>
  );
}

function ReadingForm({ onLogged }: { onLogged: () => void }) {
  const log = useLogClimate();
  const [temp, setTemp] = useState('');
  const [rh, setRh] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const [logged, setLogged] = useState<ClimateReadingView | null>(null);

  const t = parseNumber(temp);
  const h = parseNumber(rh);
  const tempOk = t != null && !Number.isNaN(t) && t >= -10 && t <= 50;
  const rhOk = h != null && !Number.isNaN(h) && h >= 1 && h <= 99;
  const preview = tempOk && rhOk ? readClimate(t!, h!) : null;

  const submit = async () => {
    setFeedback(null);
    const next: Record<string, string> = {};
    if (!tempOk) next.temp = 'A temperature from -10 to 50 deg C.';
    if (!rhOk) next.rh = 'Relative humidity from 1 to 99 %.';
    setErrors(next);
    if (Object.keys(next).length) return;
    const outcome = await log.run({ r: { tempC: t!, relativeHumidity: h! } });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setLogged(outcome.data);
    setTemp('');
    setRh('');
    onLogged();
  };

  return (
    <Card role="form" accessibilityLabel="Log a reading">
      <Heading level={2}>Log a reading</Heading>
      <FieldRow>
        <TextField label="Temperature" value={temp} onChangeText={setTemp} unit="deg C" inputMode="decimal" keyboardType="numbers-and-punctuation" error={errors.temp} testID="climate-temp" />
        <TextField label="Relative humidity" value={rh} onChangeText={setRh} unit="%" inputMode="decimal" keyboardType="decimal-pad" error={errors.rh} testID="climate-rh" />
      </FieldRow>
      {preview ? (
        <View style={[styles.preview, preview.warning ? styles.previewWarn : null]} role="status" testID="climate-preview">
          <Body variant="label" tone="secondary">
            Before you save
          </Body>
          <Body>
            The wood would settle at about <Body variant="bodyStrong">{pct(preview.emcPct)}</Body> moisture content.
          </Body>
          <Body tone={preview.warning ? 'accent' : 'success'} variant="label">
            {!preview.warning ? `Within the ${band} band` : h! < HUMIDITY_BAND.low ? `Too dry: below the ${band} band` : `Too damp: above the ${band} band`}
          </Body>
        </View>
      ) : null}
      <Button label="Save the reading" onPress={submit} busy={log.busy} stretch testID="climate-submit" />
      <Feedback state={feedback} testID="climate-feedback" />
      {logged ? (
        <View style={styles.logged} testID="climate-result">
          <Body variant="bodyStrong">
            Saved: {logged.tempC} deg C, {logged.relativeHumidity} % RH.
          </Body>
          <Body testID="climate-result-emc">Wood moisture content: {pct(logged.emcPct)}.</Body>
          {logged.warning ? (
            <Notice tone="caution" title="Act on the air" testID="climate-warning">
              {logged.warning}
            </Notice>
          ) : (
            <Body tone="success">Within the band: nothing to do.</Body>
          )}
        </View>
      ) : null}
    </Card>
  );
}

function ReadingRow({ reading: r }: { reading: ClimateReadingView }) {
  return (
    <View role="listitem" style={[styles.row, r.warning ? styles.rowWarn : null]} testID={`climate-reading-${r.id}`}>
      <View style={styles.rowTop}>
        <Body variant="bodyStrong">
          {r.tempC} deg C · {r.relativeHumidity} % RH
        </Body>
        <Body variant="small" tone="quiet">
          {formatWhen(r.at)}
        </Body>
      </View>
      <Body variant="small" tone="secondary">
        Wood moisture content {pct(r.emcPct)}
      </Body>
      {r.warning ? (
        <View style={styles.warn}>
          <View aria-hidden style={styles.wedge} />
          <Body variant="small" tone="accent" style={styles.warnText}>
            {r.warning}
          </Body>
        </View>
      ) : (
        <Body variant="small" tone="success">
          Within the band
        </Body>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: SPACE.xl, alignItems: 'flex-start' },
  stack: { flexDirection: 'column', alignItems: 'stretch' },
  form: { flex: 1, minWidth: 0 },
  list: { flex: 1.2, minWidth: 0 },
  readings: { gap: SPACE.sm },
  preview: { padding: SPACE.md, borderRadius: RADIUS.md, backgroundColor: PALETTE.feltMist, gap: SPACE.xxs },
  previewWarn: { backgroundColor: PALETTE.ivory, borderLeftWidth: 4, borderLeftColor: PALETTE.brass },
  logged: { gap: SPACE.sm, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingTop: SPACE.md },
  row: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.md, padding: SPACE.md, gap: SPACE.xxs },
  rowWarn: { borderLeftWidth: 4, borderLeftColor: PALETTE.brass },
  rowTop: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: SPACE.sm },
  warn: { flexDirection: 'row', gap: SPACE.sm, alignItems: 'flex-start' },
  warnText: { flex: 1 },
  wedge: { marginTop: 5, width: 0, height: 0, borderLeftWidth: 5, borderRightWidth: 5, borderBottomWidth: 8, borderLeftColor: 'transparent', borderRightColor: 'transparent', borderBottomColor: PALETTE.brassShade },
});
