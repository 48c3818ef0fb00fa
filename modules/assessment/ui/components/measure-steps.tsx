import { StyleSheet, View } from 'react-native';

import { BASS_WINDING, FELT_LEFT, FELT_STATES, KEYTOP_DAMAGE, STEEL_CORROSION, TUNING_PINS } from '@/modules/assessment/core/measurements';
import { fillFromRecording, newCrack, parseDecimal, type CrackDraft } from '@/modules/assessment/ui/intake-draft';
import {
  BASS_WINDING_LABELS,
  FELT_LEFT_LABELS,
  FELT_STATE_LABELS,
  KEYTOP_DAMAGE_LABELS,
  STEEL_CORROSION_LABELS,
  TUNING_PIN_LABELS,
} from '@/modules/assessment/ui/measure-labels';
import { cents, centsOffset } from '@/modules/tone/core/pitch';
import { PlayTestRecordings } from '@/modules/tone/ui/components/play-test-recordings';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Checkbox } from '@/modules/theme/ui/checkbox';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { MultiChoice } from '@/modules/theme/ui/multi-choice';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { KeyListField, MeasureInput, RatingRow, UnitSwitch, YesNo } from './fields';
import { measureSetter, type StepProps } from './step-props';

const at = (field: string) => `measurements.${field}`;

export function KeysStep({ draft, update, errorAt }: StepProps) {
  const m = draft.measurements;
  const set = measureSetter(update);
  return (
    <View style={styles.step}>
      <UnitSwitch units={draft.units} update={update} />
      <Card>
        <MeasureInput
          label="Key side play"
          hint="Push a key sideways at its front: 1-2 mm is normal, even on a new piano."
          value={m.keySidePlayMm}
          onChange={set('keySidePlayMm')}
          unit="mm"
          units={draft.units}
          error={errorAt(at('keySidePlayMm'))}
          testID="field-keySidePlayMm"
        />
        <YesNo
          label="A key can be pushed until it touches its neighbour"
          hint="Yes means worn key bushings."
          value={m.keyTouchesNeighbour}
          onChange={set('keyTouchesNeighbour')}
          error={errorAt(at('keyTouchesNeighbour'))}
          testID="choice-keyTouchesNeighbour"
        />
        {m.keyTouchesNeighbour ? (
          <KeyListField
            label="Which keys touch a neighbour"
            hint="Key numbers from 1 (the lowest A) to 88, separated by commas."
            value={m.keysTouchingNeighbour}
            onChange={set('keysTouchingNeighbour')}
            error={errorAt(at('keysTouchingNeighbour'))}
            testID="field-keysTouchingNeighbour"
          />
        ) : null}
        <MeasureInput
          label="Key level deviation"
          hint="How far the most uneven key rests above or below its neighbours."
          value={m.keyLevelDeviationMm}
          onChange={set('keyLevelDeviationMm')}
          unit="mm"
          units={draft.units}
          error={errorAt(at('keyLevelDeviationMm'))}
          testID="field-keyLevelDeviationMm"
        />
      </Card>
      <Card>
        <MultiChoice label="Keytop damage" hint="Pick all that apply." options={KEYTOP_DAMAGE} labels={KEYTOP_DAMAGE_LABELS} value={m.keytopDamage} onChange={set('keytopDamage')} testID="choice-keytopDamage" />
        <KeyListField label="Sticking keys" value={m.stickingKeys} onChange={set('stickingKeys')} error={errorAt(at('stickingKeys'))} testID="field-stickingKeys" />
        <KeyListField label="Silent (dead) keys" value={m.deadKeys} onChange={set('deadKeys')} error={errorAt(at('deadKeys'))} testID="field-deadKeys" />
      </Card>
    </View>
  );
}

export function HammersStep({ draft, update, errorAt }: StepProps) {
  const m = draft.measurements;
  const set = measureSetter(update);
  return (
    <View style={styles.step}>
      <UnitSwitch units={draft.units} update={update} />
      <Card>
        <MeasureInput
          label="Deepest string groove"
          hint="Depth of the deepest groove the strings have cut into a hammer’s felt. Shallow grooves are normal."
          value={m.hammerGrooveDepthMm}
          onChange={set('hammerGrooveDepthMm')}
          unit="mm"
          units={draft.units}
          error={errorAt(at('hammerGrooveDepthMm'))}
          testID="field-hammerGrooveDepthMm"
        />
        <ChoiceGroup
          label="Felt"
          options={FELT_STATES}
          labels={FELT_STATE_LABELS}
          value={m.hammerFelt}
          onChange={set('hammerFelt')}
          onClear={() => set('hammerFelt')(null)}
          error={errorAt(at('hammerFelt'))}
          testID="choice-hammerFelt"
        />
        <ChoiceGroup
          label="Felt left to shape"
          hint="Chemically hardened felt, or none left to shape: the hammers must be replaced."
          options={FELT_LEFT}
          labels={FELT_LEFT_LABELS}
          value={m.hammerFeltLeft}
          onChange={set('hammerFeltLeft')}
          onClear={() => set('hammerFeltLeft')(null)}
          error={errorAt(at('hammerFeltLeft'))}
          testID="choice-hammerFeltLeft"
        />
      </Card>
    </View>
  );
}

export function StringsStep({ draft, update, errorAt }: StepProps) {
  const m = draft.measurements;
  const set = measureSetter(update);
  return (
    <View style={styles.step}>
      <Card>
        <ChoiceGroup
          label="Steel (treble) strings: corrosion"
          hint="Plain steel strings: look for rust and pitting."
          options={STEEL_CORROSION}
          labels={STEEL_CORROSION_LABELS}
          value={m.steelCorrosion}
          onChange={set('steelCorrosion')}
          onClear={() => set('steelCorrosion')(null)}
          error={errorAt(at('steelCorrosion'))}
          testID="choice-steelCorrosion"
        />
        <ChoiceGroup
          label="Bass strings: copper winding"
          hint="Bright when new; dark or green with oxidation."
          options={BASS_WINDING}
          labels={BASS_WINDING_LABELS}
          value={m.bassWinding}
          onChange={set('bassWinding')}
          onClear={() => set('bassWinding')(null)}
          error={errorAt(at('bassWinding'))}
          testID="choice-bassWinding"
        />
        <TextField
          label="Broken strings"
          value={m.brokenStrings}
          onChangeText={set('brokenStrings')}
          unit="strings"
          inputMode="numeric"
          keyboardType="number-pad"
          maxLength={3}
          error={errorAt(at('brokenStrings'))}
          testID="field-brokenStrings"
        />
      </Card>
    </View>
  );
}

function CrackCard({ crack, index, units, wideGapMm, onChange, onRemove, errorAt }: {
  crack: CrackDraft;
  wideGapMm: number;
  index: number;
  units: StepProps['draft']['units'];
  onChange: (c: CrackDraft) => void;
  onRemove: () => void;
  errorAt: StepProps['errorAt'];
}) {
  const path = `measurements.soundboardCracks.${index}`;
  const set = <K extends keyof CrackDraft>(key: K) => (value: CrackDraft[K]) => onChange({ ...crack, [key]: value });
  const gap = parseDecimal(crack.widestGapMm);
  const wide = typeof gap === 'number' && gap >= wideGapMm;
  return (
    <Card role="group" accessibilityLabel={`Crack ${index + 1}`} testID={`crack-${index}`} style={styles.crack}>
      <View style={styles.crackHead}>
        <Body variant="subheading">Crack {index + 1}</Body>
        <Button label="Remove" variant="quiet" onPress={onRemove} accessibilityLabel={`Remove crack ${index + 1}`} testID={`crack-${index}-remove`} />
      </View>
      <MeasureInput label="Length" value={crack.lengthCm} onChange={set('lengthCm')} unit="cm" units={units} error={errorAt(`${path}.lengthCm`)} testID={`crack-${index}-lengthCm`} />
      <MeasureInput label="Widest gap" value={crack.widestGapMm} onChange={set('widestGapMm')} unit="mm" units={units} error={errorAt(`${path}.widestGapMm`)} testID={`crack-${index}-widestGapMm`} />
      {wide ? (
        <Body variant="small" tone="accent" testID={`crack-${index}-wide`}>
          A wide crack: a payment card fits in it.
        </Body>
      ) : null}
      <Checkbox label="Crosses a rib" checked={crack.crossesRib} onChange={set('crossesRib')} testID={`crack-${index}-crossesRib`} />
      <Checkbox label="Buzzes" checked={crack.buzzes} onChange={set('buzzes')} testID={`crack-${index}-buzzes`} />
      <Checkbox label="Affects tuning stability" checked={crack.hurtsTuning} onChange={set('hurtsTuning')} testID={`crack-${index}-hurtsTuning`} />
      <TextField label="Note" hint="Where it runs, e.g. “bass side, between ribs 3 and 4”." value={crack.note} onChangeText={set('note')} error={errorAt(`${path}.note`)} testID={`crack-${index}-note`} />
    </Card>
  );
}

export function SoundboardStep({ draft, update, errorAt, rules }: StepProps) {
  const m = draft.measurements;
  const set = measureSetter(update);
  const cracks = m.soundboardCracks;
  const setCracks = (next: CrackDraft[]) => set('soundboardCracks')(next);
  return (
    <View style={styles.step}>
      <UnitSwitch units={draft.units} update={update} />
      <Body tone="secondary" testID="card-gap-help">
        A gap that admits a payment card (0.76 mm) is a wide crack. A crack that crosses a rib, buzzes or hurts tuning stability is serious; others are cosmetic but go on the disclosure.
      </Body>
      {cracks.length === 0 ? (
        <Body tone="quiet" testID="no-cracks">
          No cracks noted. Add each crack you find.
        </Body>
      ) : null}
      {cracks.map((c, i) => (
        <CrackCard
          key={c.id}
          crack={c}
          index={i}
          units={draft.units}
          wideGapMm={rules.wideCrackGapMm}
          errorAt={errorAt}
          onChange={(next) => setCracks(cracks.map((x) => (x.id === c.id ? next : x)))}
          onRemove={() => setCracks(cracks.filter((x) => x.id !== c.id))}
        />
      ))}
      <View style={styles.left}>
        <Button label={cracks.length ? 'Add another crack' : 'Add a crack'} variant="secondary" onPress={() => setCracks([...cracks, newCrack()])} testID="add-crack" />
      </View>
      <Card>
        <YesNo
          label="Ribs separated from the board"
          value={m.ribsSeparated}
          onChange={set('ribsSeparated')}
          error={errorAt(at('ribsSeparated'))}
          testID="choice-ribsSeparated"
        />
      </Card>
    </View>
  );
}

/** "7 cents below 440 Hz" for a typed A4, or null while it is not a usable number. */
export function centsText(a4: string): string | null {
  const hz = parseDecimal(a4);
  if (typeof hz !== 'number' || hz < 300 || hz > 600) return null;
  return centsOffset(cents(hz), { above: 'above 440 Hz', below: 'below 440 Hz', at: 'at 440 Hz' });
}

export function PlayStep({ draft, update, errorAt }: StepProps) {
  const m = draft.measurements;
  const set = measureSetter(update);
  const offset = centsText(m.a4Hz);
  return (
    <View style={styles.step}>
      <Card>
        <View style={styles.pitchRow}>
          <TextField
            label="Measured A4"
            value={m.a4Hz}
            onChangeText={set('a4Hz')}
            unit="Hz"
            inputMode="decimal"
            keyboardType="decimal-pad"
            error={errorAt(at('a4Hz'))}
            testID="field-a4Hz"
          />
          <View style={styles.cents} aria-live="polite">
            <Body variant="bodyStrong" testID="a4-cents">
              {offset ?? '— cents from 440 Hz'}
            </Body>
          </View>
        </View>
        <Body variant="small" tone="quiet">
          The A above middle C (key 49), read with a tuning app or a fork.
        </Body>
        <Notice tone="caution" title="Pitch raise on old strings" testID="pitch-caution">
          Raising the pitch of old strings can break them. Wear eye protection, and leave the decision to a technician’s judgement.
        </Notice>
        <ChoiceGroup
          label="Tuning pins"
          options={TUNING_PINS}
          labels={TUNING_PIN_LABELS}
          value={m.tuningPins}
          onChange={set('tuningPins')}
          onClear={() => set('tuningPins')(null)}
          error={errorAt(at('tuningPins'))}
          testID="choice-tuningPins"
        />
      </Card>
      <Card testID="play-recording">
        <Body variant="subheading">Measure from a recording</Body>
        <Body variant="small" tone="secondary">
          Feltwire measures the pitch and level of each note, shows where the keyboard is uneven, and can fill in the fields below. The recording joins the assessment when it is submitted.
        </Body>
        <PlayTestRecordings
          draftKey={draft.draftKey}
          onDraftRecordings={(ids) => update((d) => ({ ...d, recordingIds: ids }))}
          onFill={(fill) => update((d) => ({ ...d, measurements: fillFromRecording(d.measurements, fill) }))}
        />
      </Card>
      <Card>
        <Body variant="subheading">Play test</Body>
        <Body variant="small" tone="secondary">
          From 1, plays badly, to 5, a pleasure to play. Tap a chosen number again to clear it.
        </Body>
        <RatingRow label="Bass: even from key to key" value={m.bassEvenness} onChange={set('bassEvenness')} error={errorAt(at('bassEvenness'))} testID="choice-bassEvenness" />
        <RatingRow label="Middle: even from key to key" value={m.middleEvenness} onChange={set('middleEvenness')} error={errorAt(at('middleEvenness'))} testID="choice-middleEvenness" />
        <RatingRow label="Treble: even from key to key" value={m.trebleEvenness} onChange={set('trebleEvenness')} error={errorAt(at('trebleEvenness'))} testID="choice-trebleEvenness" />
        <RatingRow label="Dynamic range, soft to loud" value={m.dynamicRange} onChange={set('dynamicRange')} error={errorAt(at('dynamicRange'))} testID="choice-dynamicRange" />
        <RatingRow label="Overall impression" value={m.overallImpression} onChange={set('overallImpression')} error={errorAt(at('overallImpression'))} testID="choice-overallImpression" />
        <KeyListField
          label="Notes that stand out"
          hint="Keys louder, brighter or duller than their neighbours: 1-88, separated by commas."
          value={m.notesStickingOut}
          onChange={set('notesStickingOut')}
          error={errorAt(at('notesStickingOut'))}
          testID="field-notesStickingOut"
        />
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: SPACE.lg },
  left: { alignItems: 'flex-start' },
  crack: { borderLeftWidth: 4, borderLeftColor: PALETTE.brass, borderRadius: RADIUS.lg },
  crackHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  pitchRow: { flexDirection: 'row', alignItems: 'flex-end', gap: SPACE.md },
  cents: { flex: 1, minWidth: 0, minHeight: 48, justifyContent: 'center' },
});
