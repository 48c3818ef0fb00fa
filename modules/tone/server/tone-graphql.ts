import { GraphQLBoolean, GraphQLEnumType, GraphQLFloat, GraphQLInputObjectType, GraphQLInt, GraphQLObjectType, GraphQLString } from 'graphql';

import type { GraphDomain } from '@/server/graphql/domain';
import { list, nn } from '@/server/graphql/types';

import { discardRecording, listRecordings, MAX_RECORDINGS_LISTED } from './tone-service';

const ToneNoteType = new GraphQLObjectType({
  name: 'ToneNote',
  description: 'One note heard in a recording.',
  fields: {
    startS: { type: nn(GraphQLFloat), description: 'Seconds from the start of the recording.' },
    frequencyHz: { type: nn(GraphQLFloat), description: 'The fundamental (first partial).' },
    key: { type: nn(GraphQLInt), description: 'The nearest key, 1 (A0) to 88 (C8).' },
    cents: { type: nn(GraphQLFloat), description: 'Cents from the key’s equal-tempered frequency at A4 = 440 Hz.' },
    levelDb: { type: nn(GraphQLFloat), description: 'RMS over the note’s first 0.3 s, dB relative to full scale.' },
  },
});

const KeyReadingType = new GraphQLObjectType({
  name: 'ToneKeyReading',
  description: 'One key across the recording (the median when it was played more than once).',
  fields: {
    key: { type: nn(GraphQLInt) },
    name: { type: nn(GraphQLString), description: 'Scientific pitch name, such as A4.' },
    frequencyHz: { type: nn(GraphQLFloat) },
    cents: { type: nn(GraphQLFloat) },
    levelDb: { type: nn(GraphQLFloat) },
    times: { type: nn(GraphQLInt) },
  },
});

const RegisterType = new GraphQLEnumType({ name: 'ToneRegister', values: { bass: {}, middle: {}, treble: {} } });

const RegisterBalanceType = new GraphQLObjectType({
  name: 'ToneRegisterBalance',
  fields: {
    register: { type: nn(RegisterType) },
    label: { type: nn(GraphQLString) },
    firstKey: { type: nn(GraphQLInt) },
    lastKey: { type: nn(GraphQLInt) },
    keys: { type: nn(GraphQLInt), description: 'Keys heard in this register.' },
    meanLevelDb: { type: GraphQLFloat },
    relativeToMiddleDb: { type: GraphQLFloat, description: 'Mean level less the middle register’s.' },
    levelSpreadDb: { type: GraphQLFloat, description: 'How far each key’s level lies from its neighbours’ (RMS, dB).' },
    meanCents: { type: GraphQLFloat },
    evenness: { type: GraphQLInt, description: 'Suggested play-test evenness 1-5 from the level spread (shop default bands).' },
  },
});

const StandOutType = new GraphQLObjectType({
  name: 'ToneStandOutNote',
  fields: {
    key: { type: nn(GraphQLInt) },
    name: { type: nn(GraphQLString) },
    measure: { type: nn(new GraphQLEnumType({ name: 'ToneMeasure', values: { pitch: {}, level: {} } })) },
    direction: { type: nn(new GraphQLEnumType({ name: 'ToneDirection', values: { sharp: {}, flat: {}, louder: {}, quieter: {} } })) },
    difference: { type: nn(GraphQLFloat), description: 'Cents or dB from the median of its neighbours.' },
    zScore: { type: nn(GraphQLFloat), description: 'Modified z-score of that difference.' },
  },
});

const PitchVerdictType = new GraphQLObjectType({
  name: 'TonePitchVerdict',
  fields: {
    overallCents: { type: GraphQLFloat, description: 'Median cents of every key heard from A4 = 440 Hz equal temperament.' },
    a4Hz: { type: GraphQLFloat },
    a4From: { type: new GraphQLEnumType({ name: 'ToneA4From', values: { key49: {}, overall: {} } }) },
    pitchRaiseNeeded: { type: nn(GraphQLBoolean) },
    pitchRaiseCents: { type: nn(GraphQLFloat), description: 'The shop’s threshold (grading rules).' },
  },
});

const KeyboardReportType = new GraphQLObjectType({
  name: 'ToneKeyboardReport',
  fields: {
    keys: { type: list(KeyReadingType) },
    registers: { type: list(RegisterBalanceType) },
    standOut: { type: list(StandOutType) },
    standOutRule: { type: nn(GraphQLString), description: 'The rule that picks the notes that stand out, in words.' },
    pitch: { type: nn(PitchVerdictType) },
    notesHeard: { type: nn(GraphQLInt) },
  },
});

export const ToneRecordingType = new GraphQLObjectType({
  name: 'ToneRecording',
  description: 'A play-test recording and what was measured from it.',
  fields: {
    id: { type: nn(GraphQLInt) },
    pianoId: { type: GraphQLInt },
    assessmentId: { type: GraphQLInt, description: 'The assessment it belongs to; null for a draft, or a piano not yet assessed.' },
    source: { type: nn(new GraphQLEnumType({ name: 'ToneSource', values: { recorded: {}, uploaded: {} } })) },
    durationS: { type: nn(GraphQLFloat) },
    sampleRate: { type: nn(GraphQLInt) },
    bytes: { type: nn(GraphQLInt) },
    recordedAt: { type: nn(GraphQLString), description: 'ISO 8601.' },
    recordedBy: { type: nn(GraphQLString) },
    url: { type: nn(GraphQLString), description: 'The WAV, through a link valid for ten minutes.' },
    notes: { type: list(ToneNoteType) },
    report: { type: nn(KeyboardReportType) },
  },
});

const RecordingsWhere = new GraphQLInputObjectType({
  name: 'ToneRecordingsWhere',
  description: 'A piano’s recordings, or your own for an intake not yet submitted.',
  fields: { pianoId: { type: GraphQLInt }, draftKey: { type: GraphQLString } },
});

const DiscardInput = new GraphQLInputObjectType({ name: 'DiscardToneRecordingInput', fields: { id: { type: nn(GraphQLInt) } } });

const DiscardResult = new GraphQLObjectType({ name: 'DiscardToneRecordingResult', fields: { id: { type: nn(GraphQLInt) } } });

export const toneGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    toneRecordings: {
      type: list(ToneRecordingType),
      description: `The newest ${MAX_RECORDINGS_LISTED} play-test recordings with their notes and keyboard report, oldest first. Every staff role may read them.`,
      args: { where: { type: nn(RecordingsWhere) } },
      extensions: { maxRows: MAX_RECORDINGS_LISTED },
      resolve: (_root, args: { where: { pianoId?: number | null; draftKey?: string | null } }, ctx) => listRecordings(ctx.photos, ctx.user, args.where),
    },
  }),
  mutations: () => ({
    discardToneRecording: {
      type: nn(DiscardResult),
      description: 'Throws away one of your own recordings made for an intake not yet submitted.',
      args: { input: { type: nn(DiscardInput) } },
      resolve: async (_root, args: { input: { id: number } }, ctx) => ({ id: await discardRecording(ctx.photos, ctx.user, args.input.id) }),
    },
  }),
};
