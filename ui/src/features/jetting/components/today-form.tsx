import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, HTMLSelect } from '@blueprintjs/core';
import { LightbulbIcon } from '@blueprintjs/icons';
import { formatDensity, type JettingSessionDto, type JetSuggestionResponse, type UnitPreferences } from '@fuelwright/shared';
import { AIR_API_FIELDS, AirReadingFields, parseAirForm, type AirFormValues } from '../../../components/air-reading-fields';
import { isApiError } from '../../../lib/api-client';
import { formErrors } from '../../../lib/form-errors';
import { useSuggestJets } from '../api/suggest-jets';

const FIELDS = [...AIR_API_FIELDS, 'baselineSessionId'] as const;

/** Today's air in, today's jets out (the newest session that ran right is the baseline unless another is picked). */
export function TodayForm({
  kartId,
  units,
  values,
  onValuesChange,
  rightSessions,
  onResult,
}: {
  kartId: string;
  units: UnitPreferences;
  values: AirFormValues;
  onValuesChange: (v: AirFormValues) => void;
  rightSessions: readonly JettingSessionDto[];
  onResult: (r: JetSuggestionResponse | undefined) => void;
}) {
  const suggest = useSuggestJets(kartId);
  const [baselineId, setBaselineId] = useState('');
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});
  const server = formErrors(suggest.error, FIELDS);
  const noBaseline = isApiError(suggest.error) && suggest.error.status === 409;
  const errors = (f: string) => clientErrors[f] ?? server.field(f);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const parsed = parseAirForm(values, units);
    setClientErrors(parsed.errors);
    if (!parsed.reading) return;
    suggest.mutate(
      { ...parsed.reading, ...(baselineId ? { baselineSessionId: baselineId } : {}) },
      { onSuccess: (r) => onResult(r), onError: () => onResult(undefined) },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Today’s weather">
      <AirReadingFields idPrefix="today" values={values} onChange={onValuesChange} units={units} errors={errors} />
      {rightSessions.length > 1 && (
        <FormGroup label="Start from" labelFor="today-baseline" helperText="The session that ran right whose jets the suggestion scales.">
          <HTMLSelect id="today-baseline" large fill value={baselineId} onChange={(e) => setBaselineId(e.currentTarget.value)}>
            <option value="">The newest session that ran right</option>
            {[...rightSessions].reverse().map((s) => (
              <option key={s.id} value={s.id}>
                {s.sessionOn}: main {s.mainJet}
                {s.pilotJet !== null ? `, pilot ${s.pilotJet}` : ''} at {formatDensity(s.densityKgM3)}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
      )}
      {noBaseline ? (
        <Callout className="fw-form-error" intent="primary" title="No baseline yet" role="status">
          {suggest.error?.message}
        </Callout>
      ) : (
        server.form && (
          <Callout className="fw-form-error" intent="danger" role="alert">
            {server.form}
          </Callout>
        )
      )}
      <Button
        className="fw-touch"
        type="submit"
        intent="primary"
        size="large"
        fill
        icon={<LightbulbIcon />}
        text="Suggest today’s jets"
        loading={suggest.isPending}
      />
    </form>
  );
}
