// The assessment's GraphQL types, made from the core's descriptions: a measurement added to MEASURES or a
// rule to RULE_FIELDS is in the API with nothing written here.
import { GraphQLBoolean, GraphQLFloat, GraphQLInt, GraphQLList, GraphQLString, type GraphQLInputType, type GraphQLOutputType } from 'graphql';

import { AREAS, MARKS, READINESS } from '@/modules/assessment/core/grade';
import { ACQUISITIONS, INSPECTION_PLACES } from '@/modules/assessment/core/intake-input';
import { MEASURES, type MeasureEntry } from '@/modules/assessment/core/measurements';
import { RULE_FIELDS } from '@/modules/assessment/core/rules-input';
import { WORK_TASKS } from '@/modules/assessment/core/work-tasks';
import { CASE_CONDITIONS, PIANO_KINDS } from '@/modules/pianos/core/piano';
import { bool, enumOf, float, input, int, list, nn, object, optStr, str } from '@/server/graphql/types';

export const AreaType = enumOf('Area', AREAS, 'A part of the piano the grade judges.');
export const MarkType = enumOf('Mark', MARKS, 'What a finding says: fine, noted, needs work, major work.');
export const ReadinessType = enumOf('Readiness', READINESS, 'The verdict a dealer acts on.');
export const WorkTaskType = enumOf('WorkTask', WORK_TASKS, 'A kind of workshop task a finding can call for.');
export const MeasureFieldType = enumOf('MeasureField', MEASURES.map((m) => m.key), 'A measurement, by its name.');

const upper = (key: string) => key.charAt(0).toUpperCase() + key.slice(1);
const choiceType = (m: MeasureEntry) => enumOf(upper(m.key), m.options!.map((o) => o.value));

const CrackType = object('SoundboardCrack', {
  lengthCm: float,
  widestGapMm: float,
  crossesRib: bool,
  buzzes: bool,
  hurtsTuning: bool,
  note: optStr,
});
// Inputs are typed loosely where the domain's schema words the refusal better (whole numbers, choices).
const CrackInputType = input('SoundboardCrackInput', {
  lengthCm: nn(GraphQLFloat),
  widestGapMm: nn(GraphQLFloat),
  crossesRib: GraphQLBoolean,
  buzzes: GraphQLBoolean,
  hurtsTuning: GraphQLBoolean,
  note: GraphQLString,
});

function outputOf(m: MeasureEntry): GraphQLOutputType {
  switch (m.kind) {
    case 'length':
    case 'pitch':
      return GraphQLFloat;
    case 'count':
    case 'rating':
      return GraphQLInt;
    case 'yesNo':
      return GraphQLBoolean;
    case 'keys':
      return new GraphQLList(nn(GraphQLInt));
    case 'choice':
      return choiceType(m);
    case 'choices':
      return new GraphQLList(nn(choiceType(m)));
    case 'cracks':
      return new GraphQLList(nn(CrackType));
  }
}

function inputOf(m: MeasureEntry): GraphQLInputType {
  switch (m.kind) {
    case 'length':
    case 'pitch':
    case 'count':
    case 'rating':
      return GraphQLFloat;
    case 'yesNo':
      return GraphQLBoolean;
    case 'keys':
      return new GraphQLList(nn(GraphQLFloat));
    case 'choice':
      return GraphQLString;
    case 'choices':
      return new GraphQLList(nn(GraphQLString));
    case 'cracks':
      return new GraphQLList(nn(CrackInputType));
  }
}

const entries = MEASURES as readonly MeasureEntry[];
export const MeasurementsType = object('Measurements', Object.fromEntries(entries.map((m) => [m.key, { type: outputOf(m), description: m.label }])), 'What an inspection measured; a measurement not taken is null.');
export const MeasurementsInputType = input('MeasurementsInput', Object.fromEntries(entries.map((m) => [m.key, { type: inputOf(m), description: m.label }])), 'What an inspection measured; leave out what was not measured.');

const WorkRecommendationType = object('WorkRecommendation', {
  task: nn(WorkTaskType),
  hours: { type: GraphQLFloat, description: 'Where the finding itself sizes the job.' },
  quantity: { type: GraphQLInt, description: 'Units, where the rate card prices the task per unit.' },
  note: optStr,
  alternativeTo: { type: WorkTaskType, description: 'A cheaper partial fix offered instead of this task.' },
});

const FindingType = object('Finding', {
  area: nn(AreaType),
  check: { ...str, description: 'A stable name for the check, such as keys.sidePlay or soundboard.crack.2.' },
  mark: nn(MarkType),
  finding: { ...str, description: 'Plain words a buyer could read.' },
  work: list(WorkRecommendationType),
  mustDisclose: bool,
  fields: { type: list(MeasureFieldType), description: 'The measurements the finding rests on.' },
});

export const GradeType = object(
  'Grade',
  {
    rulesVersion: str,
    findings: list(FindingType),
    inspectedAreas: list(AreaType),
    minInspectedAreas: int,
    provisional: bool,
    playTested: bool,
    readiness: nn(ReadinessType),
    referToTechnician: bool,
    notRecommendedForRetail: bool,
    centsFromStandard: { type: GraphQLFloat, description: 'Cents of the measured A4 from 440 Hz.' },
  },
  'The condition grade Feltwire gives an inspection.',
);

export const GradeRulesType = object('GradeRules', { version: str, ...Object.fromEntries(RULE_FIELDS.map((f) => [f.key, { type: nn(f.whole ? GraphQLInt : GraphQLFloat), description: f.label }])) }, 'The shop’s grading rules, versioned.');
export const GradeRulesInputType = input('GradeRulesInput', Object.fromEntries(RULE_FIELDS.map((f) => [f.key, { type: nn(GraphQLFloat), description: f.label }])));

export const SubmittedAssessmentType = object('SubmittedAssessment', { pianoId: int, stockNumber: str, assessmentId: int, version: int, grade: nn(GradeType) });

export const SamePianoType = object('SamePiano', { id: int, stockNumber: str, stage: str, maker: str, model: optStr, serialNumber: optStr, createdAt: str });

export const AssessmentVersionType = object('AssessmentVersion', {
  id: int,
  version: int,
  kind: str,
  measurements: nn(MeasurementsType),
  grade: nn(GradeType),
  rulesVersion: str,
  changeNote: optStr,
  submittedBy: { ...str, description: 'By name.' },
  submittedAt: str,
  remeasured: { type: list(MeasureFieldType), description: 'A re-measurement: the fields measured again after the work.' },
});

const SellerType = object('Seller', { name: str, phone: optStr, email: optStr, address: optStr });
export const IntakeRecordType = object('IntakeRecord', {
  pianoId: int,
  acquisition: nn(enumOf('Acquisition', ACQUISITIONS)),
  receivedOn: str,
  inspectedAt: nn(enumOf('InspectionPlace', INSPECTION_PLACES)),
  createdAt: str,
  samePianoAs: object('PianoReference', { id: int, stockNumber: str }),
  seller: { type: SellerType, description: 'For roles that read seller details; null for the others.' },
  notes: { type: GraphQLString, description: 'Internal notes; for roles that read seller details.' },
});

export const SellerInputType = input('SellerInput', { name: nn(GraphQLString), phone: GraphQLString, email: GraphQLString, address: GraphQLString });
const IntakePianoInputType = input('IntakePianoInput', {
  maker: nn(GraphQLString),
  model: GraphQLString,
  serialNumber: GraphQLString,
  year: GraphQLFloat,
  yearIsEstimate: GraphQLBoolean,
  yearFrom: GraphQLFloat,
  yearTo: GraphQLFloat,
  kind: { type: GraphQLString, description: PIANO_KINDS.join(' or ') },
  sizeCm: GraphQLFloat,
  finish: GraphQLString,
  caseCondition: { type: GraphQLString, description: CASE_CONDITIONS.join(', ') },
  caseNotes: GraphQLString,
});
const ids = new GraphQLList(nn(GraphQLInt));

export const IntakeInputType = input('IntakeInput', {
  seller: nn(SellerInputType),
  acquisition: { type: GraphQLString, description: ACQUISITIONS.join(', ') },
  receivedOn: GraphQLString,
  inspectedAt: { type: GraphQLString, description: INSPECTION_PLACES.join(', ') },
  piano: nn(IntakePianoInputType),
  notes: GraphQLString,
  measurements: nn(MeasurementsInputType),
  photoIds: ids,
  recordingIds: ids,
  pianoId: { type: GraphQLInt, description: 'A piano already in stock in stage received, assessed by this intake.' },
  samePianoAs: { type: GraphQLInt, description: 'The earlier record of the same piano coming back.' },
});

export const CorrectionInputType = input('CorrectionInput', {
  pianoId: nn(GraphQLInt),
  measurements: nn(MeasurementsInputType),
  changeNote: GraphQLString,
  photoIds: ids,
  recordingIds: ids,
  baseVersion: GraphQLInt,
});

export const RemeasureInputType = input('RemeasureInput', { pianoId: nn(GraphQLInt), measurements: nn(MeasurementsInputType), changeNote: GraphQLString });
