import { CHECK_RESULT_LABELS } from '@fuelwright/shared';
import type { CaseEvent } from './case-projection.js';

/** One plain line per step, for the case timeline. */
export function summarizeEvent(e: CaseEvent): string {
  switch (e.type) {
    case 'opened':
      return `Case opened with ${e.payload.symptoms.length} symptom${e.payload.symptoms.length === 1 ? '' : 's'} (ruleset ${e.payload.rulesetVersion})`;
    case 'symptoms-reported':
      return `Symptoms changed to ${e.payload.symptoms.map((s) => s.id).join(', ') || 'none'}`;
    case 'check-recorded':
      return `${e.payload.checkId}: ${CHECK_RESULT_LABELS[e.payload.result]}${e.payload.note ? ` (${e.payload.note})` : ''}`;
    case 'stopped':
      return `Stopped: ${e.payload.stop.reason}`;
    case 'resolved':
      return `Resolved: ${e.payload.causeId}, fixed by ${e.payload.fix}`;
    case 'abandoned':
      return `Abandoned${e.payload.reason ? `: ${e.payload.reason}` : ''}`;
    case 'check-recommended':
      return `Recommended check ${e.payload.checkId}: ${e.payload.reason}`;
    case 'facts-corrected':
      return `Setup and air corrected${e.payload.setup.mainJet !== undefined ? ` (main jet ${e.payload.setup.mainJet})` : ''}`;
  }
}
