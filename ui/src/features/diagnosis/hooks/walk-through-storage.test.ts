import { afterEach, describe, expect, it } from 'vitest';
import { createActor } from 'xstate';
import { emptyConditionsDraft } from '../machines/conditions-draft';
import { walkThroughMachine } from '../machines/walk-through.machine';
import { openCaseRequestFrom } from './use-save-quick-diagnosis';
import { loadQuickDiagnosis, loadWalkThrough, QUICK_DIAGNOSIS_KEY, saveWalkThrough, WALK_THROUGH_STORAGE_VERSION } from './walk-through-storage';

afterEach(() => localStorage.clear());

function quickActor() {
  const actor = createActor(walkThroughMachine, { input: { mode: 'quick', cautionCheckIds: [] } });
  actor.start();
  actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [{ id: 's1', where: ['straight'] }] });
  actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'pump-around' });
  return actor;
}

describe('walk-through storage', () => {
  it('keeps a snapshot and gives it back', () => {
    const actor = quickActor();
    saveWalkThrough(QUICK_DIAGNOSIS_KEY, actor.getPersistedSnapshot());
    const loaded = loadWalkThrough(QUICK_DIAGNOSIS_KEY);
    expect(loaded?.context.symptoms).toEqual([{ id: 's1', where: ['straight'] }]);
    expect(loadQuickDiagnosis()?.carburettorKind).toBe('pump-around');
  });

  it('drops what does not fit: another version, broken JSON, a stopped actor', () => {
    const actor = quickActor();
    const snapshot = actor.getPersistedSnapshot();
    localStorage.setItem(QUICK_DIAGNOSIS_KEY, JSON.stringify({ v: WALK_THROUGH_STORAGE_VERSION + 1, snapshot }));
    expect(loadWalkThrough(QUICK_DIAGNOSIS_KEY)).toBeNull();
    localStorage.setItem(QUICK_DIAGNOSIS_KEY, '{not json');
    expect(loadWalkThrough(QUICK_DIAGNOSIS_KEY)).toBeNull();
    actor.stop();
    saveWalkThrough(QUICK_DIAGNOSIS_KEY, actor.getPersistedSnapshot());
    expect(loadWalkThrough(QUICK_DIAGNOSIS_KEY)).toBeNull();
  });

  it("gives a snapshot kept before the intake took the day's air an empty air and fuel draft, the rest as it was", () => {
    const persisted = quickActor().getPersistedSnapshot() as unknown as { context: Record<string, unknown> };
    delete persisted.context.conditionsDraft;
    localStorage.setItem(QUICK_DIAGNOSIS_KEY, JSON.stringify({ v: WALK_THROUGH_STORAGE_VERSION, snapshot: persisted }));
    const loaded = loadWalkThrough(QUICK_DIAGNOSIS_KEY);
    expect(loaded?.context.conditionsDraft).toEqual(emptyConditionsDraft());
    expect(loaded?.context.carburettorKind).toBe('pump-around');
  });

  it("gives a snapshot kept before an open case's facts could be corrected no correction and no conditions, the rest as it was", () => {
    const persisted = quickActor().getPersistedSnapshot() as unknown as { context: Record<string, unknown> };
    delete persisted.context.correction;
    delete persisted.context.caseConditions;
    localStorage.setItem(QUICK_DIAGNOSIS_KEY, JSON.stringify({ v: WALK_THROUGH_STORAGE_VERSION, snapshot: persisted }));
    const loaded = loadWalkThrough(QUICK_DIAGNOSIS_KEY);
    expect(loaded?.context.correction).toBeNull();
    expect(loaded?.context.caseConditions).toEqual({});
    expect(loaded?.context.carburettorKind).toBe('pump-around');
  });
});

describe('saving a quick diagnosis as a case', () => {
  it('sends the symptoms, the setup values given and every result with its note', () => {
    const context = {
      ...quickActor().getSnapshot().context,
      setupDraft: { mainJet: '185', pilotJet: '' },
      results: [
        { checkId: 'c1', result: 'looks-fine' as const, note: 'fine' },
        { checkId: 'c2', result: 'not-checked' as const, note: '' },
      ],
    };
    expect(openCaseRequestFrom(context, 'kart-1')).toEqual({
      kartId: 'kart-1',
      symptoms: [{ id: 's1', where: ['straight'] }],
      setup: { mainJet: 185 },
      results: [
        { checkId: 'c1', result: 'looks-fine', note: 'fine' },
        { checkId: 'c2', result: 'not-checked' },
      ],
    });
  });

  it('leaves the setup to the kart when the visitor gave none', () => {
    const context = quickActor().getSnapshot().context;
    expect(openCaseRequestFrom(context, 'kart-1')).toEqual({ kartId: 'kart-1', symptoms: [{ id: 's1', where: ['straight'] }] });
  });
});
