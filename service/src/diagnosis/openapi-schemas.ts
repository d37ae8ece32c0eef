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

const reason: SchemaObject = {
  type: 'object',
  required: ['kind', 'text', 'likelihoodRatio', 'logOdds'],
  description: 'One piece of evidence behind a cause’s probability.',
  properties: {
    kind: { type: 'string', enum: ['rule', 'check', 'unexplained'], description: '`rule`: a fired rule; `check`: a check result (Bayes’ rule); `unexplained`: a reported symptom this cause does not usually give' },
    text: { type: 'string', description: 'One line a racer understands' },
    likelihoodRatio: { type: 'number', description: 'Factor on the odds of this cause against "something else"' },
    logOdds: { type: 'number', description: 'Natural log of `likelihoodRatio`' },
    ruleId: { type: 'string' },
    checkId: { type: 'string' },
    symptomId: { type: 'string' },
  },
};

export const RANK_RESPONSE_SCHEMA: SchemaObject = {
  type: 'object',
  required: ['version', 'causes', 'plan'],
  description: [
    'The stable minimum is `version`, `causes` (`id`, `label`, `probability`, `reasons`), `plan` (`checkId`, `label`, `group`, `minutes`, `cautions`) and, when a finding ends the walk-through, `stop` (`reason`).',
    'Every response of this version also carries the other fields described here (`somethingElse`, `excluded`, `expectedMinutes`, `cautions`; per cause `prior`, `logOdds`, `fixes`; per step `openingMinutes`, `findProbability`, `causes`, `safetyFirst`).',
    'Clients must ignore fields they do not know: later versions may add more.',
    '`causes` leaves out the "something else" bucket (see `somethingElse`) and the causes in `excluded`, so its probabilities sum to 1 minus `somethingElse.probability`.',
  ].join(' '),
  properties: {
    version: { type: 'string', description: 'Ruleset version that ranked the request (as in GET /api/catalog)' },
    causes: {
      type: 'array',
      description: 'Catalog causes, most probable first; without "something else" and without excluded causes',
      items: {
        type: 'object',
        required: ['id', 'label', 'probability', 'reasons'],
        properties: {
          id: { type: 'string' },
          label: { type: 'string' },
          probability: { type: 'number', minimum: 0, maximum: 1, description: 'Posterior probability; with `somethingElse.probability` the causes sum to 1' },
          reasons: { type: 'array', items: reason, description: 'Strongest contributions first' },
          prior: { type: 'number', description: 'Extra: prior probability before any evidence' },
          logOdds: { type: 'number', description: 'Extra: log-odds against "something else" after all evidence' },
          fixes: { type: 'array', items: { type: 'string' }, description: 'Extra: ids of the catalog fixes for this cause' },
        },
      },
    },
    somethingElse: {
      type: 'object',
      required: ['label', 'probability'],
      description: 'Extra: the catch-all bucket (a cause outside the catalog), not listed in `causes`',
      properties: { label: { type: 'string' }, probability: { type: 'number', minimum: 0, maximum: 1 } },
    },
    excluded: {
      type: 'array',
      description: 'Extra: causes left out because they cannot occur on the given carburettor kind',
      items: { type: 'object', required: ['id', 'label', 'reason'], properties: { id: { type: 'string' }, label: { type: 'string' }, reason: { type: 'string' } } },
    },
    plan: {
      type: 'array',
      description: 'Checks still to do, in order; empty after a stop finding',
      items: {
        type: 'object',
        required: ['checkId', 'label', 'group', 'minutes', 'cautions'],
        properties: {
          checkId: { type: 'string' },
          label: { type: 'string' },
          group: { type: 'string', enum: [...CHECK_GROUPS], description: 'Disassembly group the check needs open' },
          minutes: { type: 'number', description: 'Minutes of the check itself' },
          cautions: { type: 'array', items: caution, description: 'Show these before the steps' },
          openingMinutes: { type: 'number', description: 'Extra: minutes to open the group when this is its first step in the plan, else 0' },
          findProbability: { type: 'number', minimum: 0, maximum: 1, description: 'Extra: probability this check finds the fault, given the current belief' },
          causes: { type: 'array', items: { type: 'string' }, description: 'Extra: causes this check tests, most probable first' },
          safetyFirst: { type: 'boolean', description: 'Extra: placed first for safety, ahead of the cost order' },
        },
      },
    },
    expectedMinutes: { type: 'number', description: 'Extra: expected minutes to find the fault following the plan, group opening included' },
    cautions: { type: 'array', items: caution, description: 'Extra: cautions raised by the reported symptoms themselves; show them first' },
    stop: {
      type: 'object',
      required: ['reason'],
      description: 'Present when a finding ends the walk-through: do not drive; see a qualified engine builder',
      properties: { reason: { type: 'string' }, checkId: { type: 'string' }, ruleId: { type: 'string' } },
    },
  },
};
