import { useEffect, useRef, useState, type FormEvent } from 'react';
import { Button, Callout, Card, FormGroup, H2, SegmentedControl } from '@blueprintjs/core';
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
import { TextField } from '../../../components/text-field';
import { UnitsControl } from '../../../components/units-control';
import { formErrors } from '../../../lib/form-errors';
import { useCurrentUser } from '../../../lib/current-user';
import { useUnitPreferences } from '../../../lib/unit-preferences';
import { useComputeAir } from '../api/compute-air';
import { AirFigures } from './air-figures';
import { HowComputed } from './how-computed';
import '../conditions.css';

type ReferenceKind = 'isa-sea-level' | 'baseline';
const FORM_FIELDS = [...AIR_API_FIELDS, 'reference.densityKgM3'] as const;

/** Conditions: today's air from temperature, pressure and humidity, open to visitors. */
export function ConditionsPage() {
  const user = useCurrentUser();
  const { units, setUnits, saveError } = useUnitPreferences();
  const [values, setValues] = useState<AirFormValues>(EMPTY_AIR_FORM);
  const [referenceKind, setReferenceKind] = useState<ReferenceKind>('isa-sea-level');
  const [referenceDensity, setReferenceDensity] = useState('');
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
    if (referenceKind === 'baseline') {
      const d = parseDecimal(referenceDensity);
      if (d === null) errs['reference.densityKgM3'] = ['Enter the air density of your day, in kg/m³ (for example 1.190).'];
      else reference = { kind: 'baseline', densityKgM3: d };
    }
    setClientErrors(errs);
    if (!parsed.reading || Object.keys(errs).length > 0) return;
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
          <FormGroup label="Relative air density against">
            <SegmentedControl
              aria-label="Relative air density against"
              size="large"
              fill
              options={[
                { value: 'isa-sea-level', label: 'ISA sea level' },
                { value: 'baseline', label: 'A day of my own' },
              ]}
              value={referenceKind}
              onValueChange={(v) => setReferenceKind(v as ReferenceKind)}
            />
          </FormGroup>
          {referenceKind === 'baseline' && (
            <TextField
              id="conditions-reference-density"
              label="Air density of that day (kg/m³)"
              inputMode="decimal"
              autoComplete="off"
              value={referenceDensity}
              onChange={setReferenceDensity}
              errors={errors('reference.densityKgM3')}
              hint="From your jetting log, e.g. the day it ran right."
            />
          )}
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
          <AirFigures air={air} units={units} showStationPressure={values.pressureMode === 'elevation'} />
        </section>
      )}
      <HowComputed />
    </Page>
  );
}
