import { Tag, type Intent } from '@blueprintjs/core';
import { CASE_STATE_LABELS, type CaseState } from '@fuelwright/shared';

const INTENTS: Record<CaseState, Intent> = {
  open: 'primary',
  resolved: 'success',
  abandoned: 'none',
  stopped: 'danger',
};

const SHORT: Record<CaseState, string> = { ...CASE_STATE_LABELS, stopped: 'Stopped' };

/** The state of a case as a coloured tag; `long` spells out what "stopped" means. */
export function CaseStateTag({ state, long = false }: { state: CaseState; long?: boolean }) {
  return (
    <Tag round size="large" intent={INTENTS[state]} minimal={state !== 'stopped'}>
      {long ? CASE_STATE_LABELS[state] : SHORT[state]}
    </Tag>
  );
}
