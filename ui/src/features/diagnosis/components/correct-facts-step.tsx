import { useCallback, useState, type FormEvent } from 'react';
import { Button, Section, SectionCard } from '@blueprintjs/core';
import { RefreshIcon } from '@blueprintjs/icons';
import type { WalkThroughSend, WalkThroughSnapshot } from '../hooks/use-walk-through';
import { conditionsDraftEntered, type ConditionsDraft } from '../machines/conditions-draft';
import type { SetupDraftField } from '../machines/walk-through-model';
import { AirSection } from './conditions-fields';
import { SetupFields } from './setup-fields';
import { StepErrors } from './step-errors';

/** The request fields the air and fuel inputs stand for (a 400 on one of them shows under it). */
const CONDITION_FIELD = /^conditions\.((today|reference)\.(temperatureC|relativeHumidityPct|stationPressureHpa)|fuelAgeDays|densityChangePct)$/;

/**
 * Case mode, open case: correct the setup and the day's air the case was opened with (a jet
 * entered wrong, the air measured later). Prefilled from the case; saving ranks the case again
 * with the results so far.
 */
export function CorrectFactsStep({ snapshot, send }: { snapshot: WalkThroughSnapshot; send: WalkThroughSend }) {
  const ctx = snapshot.context;
  const correction = ctx.correction;
  const busy = snapshot.hasTag('busy');
  const serverFields = ctx.error?.status === 400 ? ctx.error.fields : {};
  const fieldErrors = (key: string): string[] => {
    const local = ctx.formErrors[key];
    return local ? [local] : (serverFields[key] ?? []);
  };
  const otherServerMessages = Object.entries(serverFields)
    .filter(([key]) => !key.startsWith('setup.') && !CONDITION_FIELD.test(key))
    .flatMap(([key, messages]) => messages.map((m) => `${key}: ${m}`));
  const [airShown, setAirShown] = useState(() => (correction ? conditionsDraftEntered(correction.conditionsDraft) : false));
  const airHasErrors = [...Object.keys(ctx.formErrors), ...Object.keys(serverFields)].some((k) => CONDITION_FIELD.test(k));
  const airOpen = airShown || airHasErrors;
  const changeConditions = useCallback((draft: ConditionsDraft) => send({ type: 'FACTS.CONDITIONS', draft }), [send]);
  if (!correction) return null;

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    send({ type: 'FACTS.SUBMIT' });
  };

  return (
    <form className="fw-diag-step" onSubmit={submit} noValidate aria-label="Correct the setup or today's air">
      <StepErrors error={ctx.error} otherMessages={otherServerMessages} />
      <p className="fw-muted">
        Put right what the case was opened with. The causes are ranked again with the checks done so far; the first ranking and
        this correction both stay in the case's timeline.
      </p>
      <Section className="fw-diag-section" title="Setup" subtitle="As the case holds it now. Change what was wrong.">
        <SectionCard>
          <SetupFields
            draft={correction.setupDraft}
            onChange={(field: SetupDraftField, value) => send({ type: 'FACTS.SETUP', field, value })}
            errorsFor={(field) => fieldErrors(`setup.${field}`)}
            disabled={busy}
          />
        </SectionCard>
      </Section>
      <AirSection
        open={airOpen}
        onToggle={() => setAirShown(!airOpen)}
        draft={correction.conditionsDraft}
        onChange={changeConditions}
        errorsFor={fieldErrors}
        kartId={ctx.kartId}
      />
      <div className="fw-diag-actions fw-diag-actions-main">
        <Button className="fw-touch" type="submit" intent="primary" size="large" icon={<RefreshIcon />} text="Save and rank again" loading={busy} />
        <Button className="fw-touch" size="large" variant="minimal" text="Cancel" disabled={busy} onClick={() => send({ type: 'FACTS.CANCEL' })} />
      </div>
    </form>
  );
}
