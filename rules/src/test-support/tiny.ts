/**
 * A tiny hand-made ruleset for tests whose numbers are worked out by hand. The values are made
 * up for the arithmetic; they are not trade knowledge.
 */
import type { RulesetSource } from '../model.js';
import { SHIPPED_RULESET_SOURCES, SHIPPED_RULESET_VERSION } from '../ruleset.js';

const shipped = SHIPPED_RULESET_SOURCES[SHIPPED_RULESET_VERSION].catalog as { cautions: unknown[]; groups: unknown[] };

export function tinyCatalog(): Record<string, any> {
  return {
    version: 'tiny-1',
    stopAdvice: 'Do not drive; see a qualified engine builder.',
    somethingElse: { label: 'Something else', prior: 0.5 },
    groups: structuredClone(shipped.groups),
    cautions: structuredClone(shipped.cautions),
    symptoms: [
      { id: 'sym-a', label: 'Symptom A', description: 'A.', dimensions: ['band'], otherCausesLr: 1, cautions: [] },
      { id: 'sym-b', label: 'Symptom B', description: 'B.', dimensions: [], otherCausesLr: 0.5, cautions: ['throttle-stop'] },
    ],
    causes: [
      { id: 'cause-a', label: 'Cause A', description: 'A.', prior: 0.2, fixes: [] },
      { id: 'cause-b', label: 'Cause B', description: 'B.', prior: 0.3, carburettorKinds: ['pump-around'], fixes: [] },
    ],
    checks: [
      {
        id: 'check-a',
        label: 'Check A',
        group: 'outside',
        minutes: 2,
        hazards: [],
        cautions: [],
        steps: ['Look.'],
        tools: [],
        record: [],
        faultFoundMeans: 'Found.',
        looksFineMeans: 'Fine.',
        tests: [{ cause: 'cause-a', sensitivity: 0.8 }],
        specificity: 0.9,
      },
      {
        id: 'check-b',
        label: 'Check B',
        group: 'float-bowl',
        minutes: 3,
        hazards: ['fuel'],
        cautions: ['fuel-flammable'],
        steps: ['Look inside.'],
        tools: [],
        record: [],
        faultFoundMeans: 'Found.',
        looksFineMeans: 'Fine.',
        tests: [{ cause: 'cause-b', sensitivity: 0.9 }],
        specificity: 0.95,
      },
    ],
    fixes: [],
  };
}

export function tinyRules(): Record<string, any> {
  return {
    'rules/tiny.json': {
      theme: 'Tiny',
      description: 'Hand-checked rules.',
      rules: [
        {
          name: 'a-points-at-a',
          conditions: { all: [{ fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-a' } }] },
          event: { type: 'likelihood', params: { cause: 'cause-a', lr: 3, reason: 'A points at cause A.' } },
        },
        {
          name: 'a-low-band-points-at-b',
          conditions: { all: [{ fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-a', band: ['closed'] } }] },
          event: { type: 'likelihood', params: { cause: 'cause-b', lr: 2, reason: 'A at closed throttle points at cause B.' } },
        },
        {
          name: 'stop-on-check-b',
          conditions: { all: [{ fact: 'checkResults', operator: 'resultIs', value: { check: 'check-b', result: 'fault-found' } }] },
          event: { type: 'stop', params: { check: 'check-b', reason: 'Check B found it.' } },
        },
      ],
    },
  };
}

export function tinySource(): RulesetSource {
  return { catalog: tinyCatalog(), ruleFiles: tinyRules() };
}
