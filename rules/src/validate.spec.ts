import { describe, expect, it } from 'vitest';
import { SHIPPED_RULESET_SOURCES, loadRuleset } from './ruleset.js';
import { tinyCatalog, tinyRules, tinySource } from './test-support/tiny.js';
import { RulesetValidationError, formatIssue, toRulesetSource, validateRuleset, type RulesetIssue } from './validate.js';
import { buildDiagnosisEngine } from './engine.js';
import type { Ruleset } from './model.js';

/** Runs the validator and returns its issues (fails the test if it passes). */
function issuesOf(catalog: unknown, ruleFiles: Record<string, unknown>): RulesetIssue[] {
  try {
    validateRuleset({ catalog, ruleFiles });
  } catch (err) {
    expect(err).toBeInstanceOf(RulesetValidationError);
    return (err as RulesetValidationError).issues;
  }
  throw new Error('expected the ruleset to be rejected');
}

function withRule(rule: unknown, file = 'rules/tiny.json') {
  const files = tinyRules();
  files[file] ??= { theme: 'Extra', description: 'Extra rules.', rules: [] };
  files[file].rules.push(rule);
  return files;
}

const goodEvent = { type: 'likelihood', params: { cause: 'cause-a', lr: 2, reason: 'Because.' } };
const showsA = { fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-a' } };

describe('the shipped ruleset', () => {
  it('validates, is frozen, and has a version matching its folder', () => {
    const ruleset = loadRuleset();
    expect(ruleset.version).toBe('1.0.1');
    expect(ruleset.rules.length).toBeGreaterThan(200);
    expect(Object.isFrozen(ruleset)).toBe(true);
    expect(Object.isFrozen(ruleset.catalog.checks[0].tests)).toBe(true);
    expect(loadRuleset()).toBe(ruleset);
  });

  it('holds the minimum ids the product promises (ids are stable API)', () => {
    const { catalog } = loadRuleset();
    const symptoms = catalog.symptoms.map((s) => s.id);
    const causes = catalog.causes.map((c) => c.id);
    for (const id of [
      'bog-on-acceleration', 'hesitation', 'sporadic-running', 'slow-deceleration', 'fuel-from-vents', 'hard-cold-start',
      'rich-blubber', 'lean-top-end', 'high-idle', 'cuts-out-in-corners', 'throttle-slow-to-return', 'fuel-weeping-at-bowl', 'inconsistent-laps',
    ]) expect(symptoms).toContain(id);
    for (const id of [
      'foam-degraded', 'splash-plate-bent', 'idle-screw-set', 'vent-lines-off', 'fuel-level-high', 'fuel-level-low', 'return-tube-loose',
      'air-screw-too-far-out', 'air-screw-too-far-in', 'pilot-jet-wrong-or-blocked', 'main-jet-too-small', 'main-jet-too-large',
      'needle-clip-wrong-groove', 'needle-or-clip-worn', 'choke-left-on', 'choke-not-used-cold', 'slide-sticking-or-misfitted',
      'cable-retainer-missing', 'bowl-gasket-or-screws-leaking', 'jet-flow-inconsistent', 'air-density-changed', 'fuel-pump-weak',
      'intake-air-leak', 'water-or-stale-fuel',
    ]) expect(causes).toContain(id);
  });

  it('survives a round trip through its JSON form', () => {
    const ruleset = loadRuleset();
    const again = validateRuleset(toRulesetSource(ruleset));
    expect(again.rules).toEqual(ruleset.rules);
    expect(again.catalog).toEqual(ruleset.catalog);
  });

  it('the tiny test ruleset validates', () => {
    expect(validateRuleset(tinySource()).rules.map((r) => r.name)).toEqual(['a-points-at-a', 'a-low-band-points-at-b', 'stop-on-check-b']);
  });
});

describe('catalog problems name the file, the entry and the field', () => {
  it('a missing field', () => {
    const catalog = tinyCatalog();
    delete catalog.symptoms[1].label;
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual(expect.objectContaining({ file: 'catalog.json', rule: 'symptoms[1] "sym-b"', field: 'label' }));
  });

  it('a field of the wrong type or out of range', () => {
    const catalog = tinyCatalog();
    catalog.causes[0].prior = 1.5;
    catalog.checks[0].minutes = -1;
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual(expect.objectContaining({ rule: 'causes[0] "cause-a"', field: 'prior', message: 'must be less than 1' }));
    expect(issues).toContainEqual(expect.objectContaining({ rule: 'checks[0] "check-a"', field: 'minutes' }));
  });

  it('an unknown key', () => {
    const catalog = tinyCatalog();
    catalog.causes[1].probability = 0.3;
    const issues = issuesOf(catalog, tinyRules());
    expect(issues.some((i) => i.rule === 'causes[1] "cause-b"' && /probability/.test(i.message + i.field))).toBe(true);
  });

  it('a duplicate id', () => {
    const catalog = tinyCatalog();
    catalog.causes.push({ ...catalog.causes[0] });
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual(expect.objectContaining({ rule: 'causes[2] "cause-a"', field: 'id', message: 'duplicate id "cause-a"' }));
  });

  it('a reference to an unknown cause, caution or fix', () => {
    const catalog = tinyCatalog();
    catalog.checks[0].tests[0].cause = 'cause-z';
    catalog.checks[0].cautions = ['no-such-caution'];
    catalog.causes[0].fixes = ['no-such-fix'];
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual({ file: 'catalog.json', rule: 'checks[0] "check-a"', field: 'tests[0].cause', message: 'unknown cause "cause-z"' });
    expect(issues).toContainEqual({ file: 'catalog.json', rule: 'checks[0] "check-a"', field: 'cautions[0]', message: 'unknown caution "no-such-caution"' });
    expect(issues).toContainEqual({ file: 'catalog.json', rule: 'causes[0] "cause-a"', field: 'fixes[0]', message: 'unknown fix "no-such-fix"' });
  });

  it('a check that handles fuel without the fuel caution', () => {
    const catalog = tinyCatalog();
    catalog.checks[1].cautions = []; // check-b is in the float-bowl group
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual(expect.objectContaining({ rule: 'checks[1] "check-b"', field: 'cautions', message: expect.stringContaining('"fuel-flammable"') }));
  });

  it('a check that runs the engine on a stand without the stand and throttle cautions', () => {
    const catalog = tinyCatalog();
    catalog.checks[0].hazards = ['engine-on-stand'];
    const issues = issuesOf(catalog, tinyRules());
    const messages = issues.filter((i) => i.rule === 'checks[0] "check-a"').map((i) => i.message);
    expect(messages).toContainEqual(expect.stringContaining('"engine-on-stand"'));
    expect(messages).toContainEqual(expect.stringContaining('"throttle-snap-back"'));
  });

  it('a check whose sensitivity does not beat its false-alarm rate', () => {
    const catalog = tinyCatalog();
    catalog.checks[0].tests[0].sensitivity = 0.1; // specificity 0.9: a found fault would say nothing
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual(expect.objectContaining({ rule: 'checks[0] "check-a"', field: 'tests[0].sensitivity' }));
  });

  it('a cause no check tests, and a missing group', () => {
    const catalog = tinyCatalog();
    catalog.checks[0].tests = [{ cause: 'cause-b', sensitivity: 0.8 }];
    catalog.groups = catalog.groups.filter((g: { id: string }) => g.id !== 'spark-plug');
    const issues = issuesOf(catalog, tinyRules());
    expect(issues).toContainEqual({ file: 'catalog.json', rule: 'causes[0] "cause-a"', field: 'id', message: 'no check tests this cause' });
    expect(issues).toContainEqual({ file: 'catalog.json', rule: undefined, field: 'groups', message: 'missing group "spark-plug"' });
  });
});

describe('rule problems name the file, the rule (name and position) and the field', () => {
  it('an unknown fact', () => {
    const issues = issuesOf(tinyCatalog(), withRule({ name: 'bad-fact', conditions: { all: [{ fact: 'mainJetSize', operator: 'equal', value: 1 }] }, event: goodEvent }));
    expect(issues).toEqual([{ file: 'rules/tiny.json', rule: 'rule "bad-fact" (#3)', field: 'conditions.all[0].fact', message: 'unknown fact "mainJetSize"' }]);
    expect(formatIssue(issues[0])).toBe('rules/tiny.json: rule "bad-fact" (#3): conditions.all[0].fact: unknown fact "mainJetSize"');
  });

  it('an operator the fact does not take', () => {
    const issues = issuesOf(tinyCatalog(), withRule({ name: 'bad-op', conditions: { all: [{ fact: 'carburettorKind', operator: 'greaterThan', value: 2 }] }, event: goodEvent }));
    expect(issues[0]).toMatchObject({ rule: 'rule "bad-op" (#3)', field: 'conditions.all[0].operator' });
  });

  it('a value of the wrong type, out of range, or not in the list', () => {
    const files = withRule({
      name: 'bad-values',
      conditions: {
        all: [
          { fact: 'airScrewTurnsOut', operator: 'greaterThan', value: '2' },
          { fact: 'mainJet', operator: 'lessThan', value: 900 },
          { fact: 'idleScrew', operator: 'equal', value: 'half' },
          { fact: 'ventLinesFitted', operator: 'equal', value: 'no' },
        ],
      },
      event: goodEvent,
    });
    const fields = issuesOf(tinyCatalog(), files).map((i) => `${i.field}: ${i.message}`);
    expect(fields).toEqual([
      'conditions.all[0].value: must be a number',
      'conditions.all[1].value: must be within 50..400',
      'conditions.all[2].value: must be one of backed-off, set',
      'conditions.all[3].value: must be true or false',
    ]);
  });

  it('an unknown symptom, band or check in a condition', () => {
    const files = withRule({
      name: 'bad-refs',
      conditions: {
        any: [
          { fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-z' } },
          { fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-a', band: ['half'] } },
          { fact: 'checkResults', operator: 'resultIs', value: { check: 'check-z', result: 'fault-found' } },
          { fact: 'checkResults', operator: 'resultIs', value: { check: 'check-a', result: 'maybe' } },
        ],
      },
      event: goodEvent,
    });
    const fields = issuesOf(tinyCatalog(), files).map((i) => `${i.field}: ${i.message}`);
    expect(fields).toEqual([
      'conditions.any[0].value.symptom: unknown symptom "sym-z"',
      'conditions.any[1].value.band[0]: must be one of closed, up-to-quarter, quarter-to-three-quarters, three-quarters-to-full',
      'conditions.any[2].value.check: unknown check "check-z"',
      'conditions.any[3].value.result: must be one of fault-found, looks-fine, not-checked',
    ]);
  });

  it('condition structure json-rules-engine would misread or we do not support', () => {
    const files = withRule({
      name: 'bad-structure',
      conditions: {
        all: [
          { condition: 'shared-condition' },
          { all: [] },
          { not: [showsA] },
          { fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-a' }, path: '$.x' },
          { all: [showsA], any: [showsA] },
        ],
      },
      event: goodEvent,
    });
    const fields = issuesOf(tinyCatalog(), files).map((i) => i.field);
    expect(fields).toEqual(['conditions.all[0].condition', 'conditions.all[1].all', 'conditions.all[2].not', 'conditions.all[3].path', 'conditions.all[4]']);
    const top = issuesOf(tinyCatalog(), withRule({ name: 'leaf-at-top', conditions: showsA, event: goodEvent }));
    expect(top).toEqual([{ file: 'rules/tiny.json', rule: 'rule "leaf-at-top" (#3)', field: 'conditions', message: 'must start with all, any or not' }]);
  });

  it('a bad event: unknown cause, ratio of 1 or out of range, empty reason, unknown type, stop on an unknown check', () => {
    const files = withRule({ name: 'unknown-cause', conditions: { all: [showsA] }, event: { type: 'likelihood', params: { cause: 'cause-z', lr: 2, reason: 'x' } } });
    files['rules/tiny.json'].rules.push(
      { name: 'lr-one', conditions: { all: [showsA] }, event: { type: 'likelihood', params: { cause: 'cause-a', lr: 1, reason: 'x' } } },
      { name: 'lr-huge', conditions: { all: [showsA] }, event: { type: 'likelihood', params: { cause: 'cause-a', lr: 500, reason: 'x' } } },
      { name: 'no-reason', conditions: { all: [showsA] }, event: { type: 'likelihood', params: { cause: 'cause-a', lr: 2, reason: ' ' } } },
      { name: 'odd-type', conditions: { all: [showsA] }, event: { type: 'boost', params: {} } },
      { name: 'stop-unknown', conditions: { all: [showsA] }, event: { type: 'stop', params: { check: 'check-z', reason: 'x' } } },
    );
    const got = issuesOf(tinyCatalog(), files).map((i) => `${i.rule} ${i.field}: ${i.message}`);
    expect(got).toEqual([
      'rule "unknown-cause" (#3) event.params.cause: unknown cause "cause-z"',
      'rule "lr-one" (#4) event.params.lr: must not be 1 (a ratio of 1 changes nothing)',
      'rule "lr-huge" (#5) event.params.lr: must be at most 100',
      'rule "no-reason" (#6) event.params.reason: must not be empty',
      'rule "odd-type" (#7) event.type: must be "likelihood" or "stop"',
      'rule "stop-unknown" (#8) event.params.check: unknown check "check-z"',
    ]);
  });

  it('a rule without a name, a badly named rule, and a duplicate name across files', () => {
    const files = withRule({ conditions: { all: [showsA] }, event: goodEvent });
    files['rules/other.json'] = { theme: 'Other', description: 'Other.', rules: [{ name: 'a-points-at-a', conditions: { all: [showsA] }, event: goodEvent }, { name: 'Bad Name', conditions: { all: [showsA] }, event: goodEvent }] };
    const got = issuesOf(tinyCatalog(), files).map((i) => `${i.file} ${i.rule} ${i.field}`);
    expect(got).toContain('rules/tiny.json rule #3 name');
    expect(got).toContain('rules/other.json rule "Bad Name" (#1) name');
    // Files are read in name order, so the second one met (rules/tiny.json) is the duplicate.
    const dup = issuesOf(tinyCatalog(), files).find((i) => i.rule === 'rule "a-points-at-a" (#0)' && i.file === 'rules/tiny.json');
    expect(dup).toMatchObject({ field: 'name', message: 'duplicate rule name (also in rules/other.json)' });
  });

  it('a file that is not a rule file, or is named outside rules/', () => {
    const files = tinyRules();
    files['rules/broken.json'] = { rules: 'none' };
    files['extra.json'] = { theme: 'x', description: 'x', rules: [] };
    const issues = issuesOf(tinyCatalog(), files);
    expect(issues).toContainEqual(expect.objectContaining({ file: 'rules/broken.json', field: 'theme' }));
    expect(issues).toContainEqual(expect.objectContaining({ file: 'rules/broken.json', field: 'rules' }));
    expect(issues).toContainEqual(expect.objectContaining({ file: 'extra.json', field: '(file name)' }));
  });

  it('collects every problem, and the error message lists them', () => {
    const catalog = tinyCatalog();
    catalog.checks[0].tests[0].cause = 'cause-z';
    try {
      validateRuleset({ catalog, ruleFiles: tinyRules() });
      expect.unreachable();
    } catch (err) {
      const e = err as RulesetValidationError;
      expect(e.issues.length).toBeGreaterThanOrEqual(2); // unknown cause, and cause-a untested
      expect(e.message).toContain('catalog.json: checks[0] "check-a": tests[0].cause: unknown cause "cause-z"');
    }
  });

  it('the engine refuses a ruleset object that did not pass the validator and does not validate', () => {
    const good = validateRuleset(tinySource());
    const tampered = JSON.parse(JSON.stringify(good)) as Ruleset;
    (tampered.rules[0].event as { params: { lr: number } }).params.lr = -3;
    expect(() => buildDiagnosisEngine(tampered)).toThrow(/event\.params\.lr: must be greater than 0/);
  });

  it('the shipped JSON source is what loadRuleset validates', () => {
    expect(Object.keys(SHIPPED_RULESET_SOURCES['1.0.1'].ruleFiles).every((f) => f.startsWith('rules/'))).toBe(true);
  });

  it('keeps every shipped version loadable under its own number (cases keep the version they were opened with)', () => {
    expect(Object.keys(SHIPPED_RULESET_SOURCES)).toEqual(['1.0.0', '1.0.1']);
    for (const v of Object.keys(SHIPPED_RULESET_SOURCES)) expect(loadRuleset(v).version).toBe(v);
    // 1.0.0 is as released: the fuel cautions of the premix and vent-line checks came in 1.0.1.
    expect(loadRuleset('1.0.0').catalog.checks.find((k) => k.id === 'premix-record')!.cautions).toEqual([]);
  });
});
