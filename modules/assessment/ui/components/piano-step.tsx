import { StyleSheet, View } from 'react-native';

import { ACQUISITIONS, ACQUISITION_LABELS, INSPECTION_PLACES, INSPECTION_PLACE_LABELS } from '@/modules/assessment/core/intake-input';
import { normalizeDate, type AssessmentDraft, type PianoDraft } from '@/modules/assessment/ui/intake-draft';
import { CASE_CONDITION_LABELS, KIND_LABELS } from '@/modules/assessment/ui/measure-labels';
import { CASE_CONDITIONS, PIANO_KINDS } from '@/modules/pianos/core/piano';
import { SPACE } from '@/modules/theme/core/palette';
import { Card } from '@/modules/theme/ui/card';
import { Checkbox } from '@/modules/theme/ui/checkbox';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { MeasureInput, UnitSwitch } from './fields';
import { SamePianoNotice } from './same-piano-notice';
import type { StepProps } from './step-props';

const YEAR_MODES = ['year', 'range'] as const;
const YEAR_MODE_LABELS: Record<PianoDraft['yearMode'], string> = { year: 'A year', range: 'A range (estimate)' };

/** Step 1: who sells, how the piano comes to the shop, and what it is. */
export function PianoStep({ draft, update, errorAt }: StepProps) {
  const setSeller = (key: keyof AssessmentDraft['seller']) => (value: string) => update((d) => ({ ...d, seller: { ...d.seller, [key]: value } }));
  const setPiano =
    <K extends keyof PianoDraft>(key: K) =>
    (value: PianoDraft[K]) =>
      update((d) => ({ ...d, piano: { ...d.piano, [key]: value } }));
  const p = draft.piano;
  const sizeLabel = p.kind === 'grand' ? 'Length' : p.kind === 'upright' ? 'Height' : 'Size';
  const sizeHint = p.kind === 'grand' ? 'Length of the grand, front of the keyboard to the tail.' : p.kind === 'upright' ? 'Height of the upright, floor to lid.' : 'Height of an upright, length of a grand.';

  return (
    <View style={styles.step}>
      <Card role="group" accessibilityLabel="Seller">
        <Body variant="subheading">Seller</Body>
        <Body variant="small" tone="secondary" testID="personal-data-note">
          Personal data: the seller’s name and contact details are visible to intake staff and managers only.
        </Body>
        <TextField label="Name" value={draft.seller.name} onChangeText={setSeller('name')} error={errorAt('seller.name')} autoCapitalize="words" autoComplete="off" testID="field-seller-name" />
        <TextField label="Phone" value={draft.seller.phone} onChangeText={setSeller('phone')} error={errorAt('seller.phone')} inputMode="tel" keyboardType="phone-pad" autoComplete="off" testID="field-seller-phone" />
        <TextField
          label="E-mail"
          value={draft.seller.email}
          onChangeText={setSeller('email')}
          error={errorAt('seller.email')}
          inputMode="email"
          keyboardType="email-address"
          autoCapitalize="none"
          autoComplete="off"
          testID="field-seller-email"
        />
        <TextField label="Address" value={draft.seller.address} onChangeText={setSeller('address')} error={errorAt('seller.address')} multiline autoComplete="off" testID="field-seller-address" />
      </Card>

      <Card role="group" accessibilityLabel="The deal">
        <Body variant="subheading">How it comes to us</Body>
        <ChoiceGroup
          label="Acquisition"
          options={ACQUISITIONS}
          labels={ACQUISITION_LABELS}
          value={draft.acquisition}
          onChange={(v) => update((d) => ({ ...d, acquisition: v }))}
          error={errorAt('acquisition')}
          testID="choice-acquisition"
        />
        <TextField
          label="Date received"
          hint="YYYY-MM-DD, today unless it came in earlier; digits alone will do (20261130)."
          value={draft.receivedOn}
          onChangeText={(v) => update((d) => ({ ...d, receivedOn: v }))}
          onBlur={() => {
            if (normalizeDate(draft.receivedOn) !== draft.receivedOn) update((d) => ({ ...d, receivedOn: normalizeDate(d.receivedOn) }));
          }}
          error={errorAt('receivedOn')}
          inputMode="numeric"
          maxLength={10}
          short
          testID="field-receivedOn"
        />
        <ChoiceGroup
          label="Where inspected"
          options={INSPECTION_PLACES}
          labels={INSPECTION_PLACE_LABELS}
          value={draft.inspectedAt}
          onChange={(v) => update((d) => ({ ...d, inspectedAt: v }))}
          error={errorAt('inspectedAt')}
          testID="choice-inspectedAt"
        />
      </Card>

      <Card role="group" accessibilityLabel="The piano">
        <Body variant="subheading">The piano</Body>
        <TextField label="Maker" hint="The name on the fallboard or the plate." value={p.maker} onChangeText={setPiano('maker')} error={errorAt('piano.maker')} autoCapitalize="words" testID="field-maker" />
        <TextField label="Model" value={p.model} onChangeText={setPiano('model')} error={errorAt('piano.model')} testID="field-model" />
        <TextField
          label="Serial number"
          hint="Usually stamped on the plate or the pin block."
          value={p.serialNumber}
          onChangeText={setPiano('serialNumber')}
          error={errorAt('piano.serialNumber')}
          autoCapitalize="characters"
          testID="field-serialNumber"
        />
        <SamePianoNotice draft={draft} update={update} error={errorAt('samePianoAs')} />
        <ChoiceGroup label="Kind" options={PIANO_KINDS} labels={KIND_LABELS} value={p.kind} onChange={setPiano('kind')} error={errorAt('piano.kind')} testID="choice-kind" />
        <UnitSwitch units={draft.units} update={update} />
        <MeasureInput label={sizeLabel} hint={sizeHint} value={p.sizeCm} onChange={setPiano('sizeCm')} unit="cm" units={draft.units} error={errorAt('piano.sizeCm')} testID="field-sizeCm" />
        <ChoiceGroup label="Year made" options={YEAR_MODES} labels={YEAR_MODE_LABELS} value={p.yearMode} onChange={setPiano('yearMode')} testID="choice-yearMode" />
        {p.yearMode === 'year' ? (
          <View style={styles.group}>
            <TextField label="Year" value={p.year} onChangeText={setPiano('year')} error={errorAt('piano.year')} inputMode="numeric" keyboardType="number-pad" maxLength={4} short testID="field-year" />
            <Checkbox label="The year is an estimate" checked={p.yearIsEstimate} onChange={setPiano('yearIsEstimate')} testID="field-yearIsEstimate" />
          </View>
        ) : (
          <View style={styles.range}>
            <TextField label="From" value={p.yearFrom} onChangeText={setPiano('yearFrom')} error={errorAt('piano.yearFrom')} inputMode="numeric" keyboardType="number-pad" maxLength={4} short testID="field-yearFrom" />
            <TextField label="To" value={p.yearTo} onChangeText={setPiano('yearTo')} error={errorAt('piano.yearTo')} inputMode="numeric" keyboardType="number-pad" maxLength={4} short testID="field-yearTo" />
          </View>
        )}
        <TextField label="Finish" hint="For example satin walnut or polished black." value={p.finish} onChangeText={setPiano('finish')} error={errorAt('piano.finish')} testID="field-finish" />
      </Card>

      <Card role="group" accessibilityLabel="The case">
        <Body variant="subheading">The case</Body>
        <ChoiceGroup
          label="Case condition"
          options={CASE_CONDITIONS}
          labels={CASE_CONDITION_LABELS}
          value={p.caseCondition}
          onChange={setPiano('caseCondition')}
          onClear={() => setPiano('caseCondition')(null)}
          error={errorAt('piano.caseCondition')}
          testID="choice-caseCondition"
        />
        <TextField label="Case notes" hint="Scratches, veneer lifting, missing parts, water marks." value={p.caseNotes} onChangeText={setPiano('caseNotes')} error={errorAt('piano.caseNotes')} multiline testID="field-caseNotes" />
      </Card>

      <Card role="group" accessibilityLabel="Internal notes">
        <TextField
          label="Internal notes"
          hint="For the team only: never printed on the buyer’s disclosure."
          value={draft.notes}
          onChangeText={(v) => update((d) => ({ ...d, notes: v }))}
          error={errorAt('notes')}
          multiline
          testID="field-notes"
        />
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: SPACE.lg },
  group: { gap: SPACE.xs },
  range: { flexDirection: 'row', gap: SPACE.md, flexWrap: 'wrap' },
});
