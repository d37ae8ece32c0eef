import { useEffect, useRef, useState, type FormEvent } from 'react';
import { Button, Callout, Card, H2 } from '@blueprintjs/core';
import { CalculatorIcon, CloudIcon } from '@blueprintjs/icons';
import type { AirRequest } from '@fuelwright/shared';
import {
  AIR_API_FIELDS,
  AirReadingFields,
  EMPTY_AIR_FORM,
  parseAirForm,
  parseDecimal,
  useConvertOnUnitChange,
  type AirFormValues,
} from '../../../components/air-reading-fields';
import { Page } from '../../../components/page';
import { UnitsControl } from '../../../components/units-control';
import { formErrors } from '../../../lib/form-errors';
import { useCurrentUser } from '../../../lib/current-user';
import { useUnitPreferences } from '../../../lib/unit-preferences';
import { useComputeAir } from '../api/compute-air';
import { useReferenceSessions } from '../api/get-reference-sessions';
import {
  ISA_REFERENCE_TEXT,
  loadReferenceChoice,
  sessionReferenceText,
  storeReferenceChoice,
  typedReferenceText,
  type ReferenceChoice,
} from '../lib/air-reference';
import { AirFigures } from './air-figures';
import { HowComputed } from './how-computed';
import { ReferencePicker } from './reference-picker';
import '../conditions.css';

const FORM_FIELDS = [...AIR_API_FIELDS, 'reference.densityKgM3'] as const;

/** Conditions: today's air from temperature, pressure and humidity, open to visitors. */
export function ConditionsPage() {
  const user = useCurrentUser();
  const { units, setUnits, saveError } = useUnitPreferences();
  const [values, setValues] = useState<AirFormValues>(EMPTY_AIR_FORM);
  const [storedChoice, setStoredChoice] = useState<ReferenceChoice>(loadReferenceChoice);
  // A visitor has no logged sessions: a remembered session falls back to ISA sea level.
  const choice: ReferenceChoice = !user && storedChoice.kind === 'session' ? { kind: 'isa-sea-level' } : storedChoice;
  const pickReference = (next: ReferenceChoice) => {
    setStoredChoice(next);
    storeReferenceChoice(next);
  };
  const sessions = useReferenceSessions(Boolean(user) && choice.kind === 'session');
  const sessionList = sessions.status === 'ready' ? sessions.sessions : [];
  const selectedSession =
    choice.kind === 'session' ? (sessionList.find((s) => s.id === choice.sessionId) ?? sessionList[0] ?? null) : null;
  /** The reference of the figures on screen, in words (set when they are asked for). */
  const [resultReference, setResultReference] = useState(ISA_REFERENCE_TEXT);
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});
  const compute = useComputeAir();
  useConvertOnUnitChange(units, setValues);
  const server = formErrors(compute.error, FORM_FIELDS);
  const errors = (field: string) => clientErrors[field] ?? server.field(field);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const parsed = parseAirForm(values, units);
    const errs = { ...parsed.errors };
    let reference: AirRequest['reference'];
    let referenceText = ISA_REFERENCE_TEXT;
    if (choice.kind === 'typed') {
      const d = parseDecimal(choice.densityText);
      if (d === null) errs['reference.densityKgM3'] = ['Enter the reference air density, in kg/m³ (for example 1.190).'];
      else {
        reference = { kind: 'baseline', densityKgM3: d };
        referenceText = typedReferenceText(d);
      }
    } else if (choice.kind === 'session') {
      if (!selectedSession) errs['reference.session'] = ['Pick one of your logged sessions, or another reference.'];
      else {
        reference = { kind: 'baseline', densityKgM3: selectedSession.densityKgM3 };
        referenceText = sessionReferenceText(selectedSession);
      }
    }
    setClientErrors(errs);
    if (!parsed.reading || Object.keys(errs).length > 0) return;
    setResultReference(referenceText);
    compute.mutate({ ...parsed.reading, ...(reference ? { reference } : {}) } as AirRequest);
  };

  const air = compute.data;
  const resultRef = useRef<HTMLElement>(null);
  // On a phone the figures are below the fold: bring them into view when they arrive.
  useEffect(() => {
    if (air) resultRef.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }, [air]);
  return (
    <Page
      title={
        <>
          <CloudIcon size={28} className="fw-title-icon" /> Conditions
        </>
      }
      lead="Today’s air: how dense it is, what that means for the engine, and the figures the jetting needs."
    >
      <Card className="fw-form-card">
        <form onSubmit={submit} noValidate aria-label="Today’s air">
          <UnitsControl idPrefix="conditions-units" units={units} onChange={setUnits} />
          {saveError && (
            <Callout intent="warning" className="fw-form-note">
              Your units could not be saved: {saveError.message}
            </Callout>
          )}
          {!user && <p className="fw-muted fw-small fw-units-note">Your units are kept in this browser.</p>}
          <AirReadingFields idPrefix="conditions" values={values} onChange={setValues} units={units} errors={errors} />
          <ReferencePicker
            choice={choice}
            onChange={pickReference}
            signedIn={Boolean(user)}
            sessions={sessions}
            selected={selectedSession}
            errors={errors}
          />
          {server.form && (
            <Callout className="fw-form-error" intent="danger" role="alert">
              {server.form}
            </Callout>
          )}
          <Button
            className="fw-touch"
            type="submit"
            intent="primary"
            size="large"
            fill
            icon={<CalculatorIcon />}
            text="Work out the air"
            loading={compute.isPending}
          />
        </form>
      </Card>

      {air && (
        <section ref={resultRef} className="fw-air-result" aria-label="Today’s air">
          <H2 className="fw-section-title">Today’s air</H2>
          {air.warnings.length > 0 && (
            <Callout intent="warning" title="Outside the usual range" className="fw-air-warnings">
              <ul className="fw-caution-list">
                {air.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            </Callout>
          )}
          <p className="fw-reference-used" data-testid="reference-used">
            Relative air density against {resultReference}.
          </p>
          <AirFigures air={air} units={units} referenceText={resultReference} showStationPressure={values.pressureMode === 'elevation'} />
        </section>
      )}
      <HowComputed referenceText={air ? resultReference : undefined} />
    </Page>
  );
}
