import type { ApiResponseSchemaHost } from '@nestjs/swagger';
import {
  CAUTION_SEVERITIES,
  CHECK_GROUPS,
  CHECK_RESULT_VALUES,
  ENGINE_TEMPS,
  IDLE_SCREW_STATES,
  CARBURETTOR_KINDS,
  THROTTLE_BANDS,
  TRACK_POSITIONS,
} from '@fuelwright/shared';

type SchemaObject = ApiResponseSchemaHost['schema'];

/** OpenAPI descriptions of the diagnosis contract (the wire types live in @fuelwright/shared). */
const oneOrMany = (values: readonly string[]): SchemaObject => ({
  oneOf: [{ type: 'string', enum: [...values] }, { type: 'array', items: { type: 'string', enum: [...values] } }],
});

const caution: SchemaObject = {
  type: 'object',
  required: ['id', 'severity', 'title', 'text'],
  properties: { id: { type: 'string' }, severity: { type: 'string', enum: [...CAUTION_SEVERITIES] }, title: { type: 'string' }, text: { type: 'string' } },
};

const labelled: SchemaObject = { type: 'object', required: ['id', 'label'], properties: { id: { type: 'string' }, label: { type: 'string' } } };

export const CATALOG_SCHEMA: SchemaObject = {
  type: 'object',
  required: ['version', 'symptoms', 'causes', 'checks'],
  properties: {
    version: { type: 'string', example: '1.0.0' },
    symptoms: { type: 'array', items: { ...labelled, properties: { ...labelled.properties, description: { type: 'string' }, dimensions: { type: 'array', items: { type: 'string', enum: ['band', 'engine', 'where'] } }, cautions: { type: 'array', items: caution } } } },
    causes: { type: 'array', items: { ...labelled, properties: { ...labelled.properties, description: { type: 'string' }, prior: { type: 'number' }, fixes: { type: 'array', items: { type: 'string' } } } } },
    checks: {
      type: 'array',
      items: {
        ...labelled,
        properties: {
          ...labelled.properties,
          group: { type: 'string', enum: [...CHECK_GROUPS] },
          minutes: { type: 'number' },
          cautions: { type: 'array', items: caution },
          steps: { type: 'array', items: { type: 'string' } },
          tools: { type: 'array', items: { type: 'string' } },
          record: { type: 'array', items: { type: 'string' } },
          stopOnFault: { type: 'boolean' },
        },
      },
    },
    groups: { type: 'array', items: { ...labelled, properties: { ...labelled.properties, openingMinutes: { type: 'number' } } } },
    fixes: { type: 'array', items: labelled },
    throttleBands: { type: 'array', items: labelled },
    engineTemps: { type: 'array', items: labelled },
    trackPositions: { type: 'array', items: labelled },
  },
};

export const RANK_REQUEST_SCHEMA: SchemaObject = {
  type: 'object',
  required: ['symptoms'],
  properties: {
    symptoms: {
      type: 'array',
      description: 'Symptom ids from the catalog, bare or with where they show',
      items: {
        oneOf: [
          { type: 'string', example: 'bog-on-acceleration' },
          {
            type: 'object',
            required: ['id'],
            properties: { id: { type: 'string' }, band: oneOrMany(THROTTLE_BANDS), engine: oneOrMany(ENGINE_TEMPS), where: oneOrMany(TRACK_POSITIONS) },
          },
        ],
      },
    },
    setup: {
      type: 'object',
      properties: {
        carburettorKind: { type: 'string', enum: [...CARBURETTOR_KINDS] },
        mainJet: { type: 'number' },
        pilotJet: { type: 'number' },
        needleClipGroove: { type: 'integer', description: 'Counted from the top of the needle' },
        airScrewTurnsOut: { type: 'number' },
        idleScrew: { type: 'string', enum: [...IDLE_SCREW_STATES] },
        idleScrewTurns: { type: 'number' },
        foamFittedDate: { type: 'string', format: 'date' },
        lastRebuildDate: { type: 'string', format: 'date' },
        premixRatio: { type: 'number' },
        ventLinesFitted: { type: 'boolean' },
        ventLinesRoutedUp: { type: 'boolean' },
      },
    },
    conditions: {
      type: 'object',
      properties: {
        densityChangePct: { type: 'number', description: 'Air density today against the day the setup was last right, percent; positive = denser today' },
        today: { type: 'object' },
        reference: { type: 'object' },
        fuelAgeDays: { type: 'number' },
      },
    },
    results: { type: 'object', additionalProperties: { type: 'string', enum: [...CHECK_RESULT_VALUES] }, description: 'Check results by check id' },
    engineDisplacementCc: { type: 'number' },
    asOf: { type: 'string', format: 'date' },
  },
  example: { symptoms: [{ id: 'bog-on-acceleration', band: 'up-to-quarter' }, 'sporadic-running'], setup: { carburettorKind: 'pump-around' }, results: {} },
};

export const RANK_RESPONSE_SCHEMA: SchemaObject = {
  type: 'object',
  required: ['version', 'causes', 'plan'],
  properties: {
    version: { type: 'string' },
    causes: {
      type: 'array',
      items: {
        type: 'object',
        properties: {
          id: { type: 'string' },
          label: { type: 'string' },
          probability: { type: 'number' },
          reasons: { type: 'array', items: { type: 'object', properties: { kind: { type: 'string' }, text: { type: 'string' }, likelihoodRatio: { type: 'number' }, logOdds: { type: 'number' } } } },
        },
      },
    },
    somethingElse: { type: 'object', properties: { label: { type: 'string' }, probability: { type: 'number' } } },
    plan: {
      type: 'array',
      items: {
        type: 'object',
        properties: {
          checkId: { type: 'string' },
          label: { type: 'string' },
          group: { type: 'string', enum: [...CHECK_GROUPS] },
          minutes: { type: 'number' },
          openingMinutes: { type: 'number' },
          cautions: { type: 'array', items: caution },
        },
      },
    },
    expectedMinutes: { type: 'number' },
    cautions: { type: 'array', items: caution },
    stop: { type: 'object', properties: { reason: { type: 'string' }, checkId: { type: 'string' }, ruleId: { type: 'string' } } },
  },
};
