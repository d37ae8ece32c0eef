import { useEffect, type ComponentProps } from 'react';
import { Callout, FormGroup, Section, SectionCard, SegmentedControl } from '@blueprintjs/core';
import {
  formatDensity,
  formatPercent,
  formatPressure,
  formatTemperature,
  UNIT_SYMBOLS,
  type UnitPreferences,
} from '@fuelwright/shared';
import { AirReadingFields, convertAirForm } from '../../../components/air-reading-fields';
import { TextField } from '../../../components/text-field';
import { UnitsControl } from '../../../components/units-control';
import { useCurrentUser } from '../../../lib/current-user';
import { useUnitPreferences } from '../../../lib/unit-preferences';
import { useReferenceSession } from '../api/get-reference-session';
import { parseConditionsDraft, type ConditionsDraft, type ReferenceSession } from '../machines/conditions-draft';

/** Within this much, the air is "about the same" (the ruleset's "air density steady" band). */
const STEADY_PCT = 1.5;

const sameUnits = (a: UnitPreferences, b: UnitPreferences) => a.temperature === b.temperature && a.pressure === b.pressure && a.length === b.length;

function formatDay(iso: string): string {
  const date = new Date(`${iso}T12:00:00`);
  return Number.isNaN(date.getTime()) ? iso : date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/** What the figures say, in trade words: how much denser or thinner the air is, and which way that moves the mixture. */
function DensityReadout({ draft, errors }: { draft: ConditionsDraft; errors: string[] }) {
  const parsed = parseConditionsDraft(draft);
  const { todayDensityKgM3: today, referenceDensityKgM3: then, densityChangePct: change } = parsed;
  if (errors.length > 0) {
    return (
      <Callout intent="danger" role="alert" className="fw-diag-air-readout">
        {errors.map((m) => (
          <p key={m} className="fw-field-error">
            {m}
          </p>
        ))}
      </Callout>
    );
  }
  if (change === null) {
    return (
      <p className="fw-muted fw-diag-air-readout" aria-live="polite">
        {today !== null
          ? `Air today: ${formatDensity(today)}. Give the air of the day it last ran right to see how much it has changed.`
          : 'Give the temperature, pressure and humidity of both days to see how much the air has changed.'}
      </p>
    );
  }
  const steady = Math.abs(change) < STEADY_PCT;
  const denser = change > 0;
  const title = steady
    ? `About the same air as on the day it ran right (${formatPercent(change, { decimals: 1 })})`
    : `The air is ${formatPercent(Math.abs(change), { decimals: 1 })} ${denser ? 'denser' : 'thinner'} than on the day it ran right`;
  return (
    <Callout intent={steady ? 'success' : 'primary'} title={title} className="fw-diag-air-readout" aria-live="polite">
      <p>
        {steady
          ? 'A change this small hardly moves the mixture: look elsewhere before touching the jets for the weather.'
          : denser
            ? 'Denser air leans the mixture: the same jets meet more air, so a setup that was right then runs leaner today.'
            : 'Thinner air richens the mixture: the same jets meet less air, so a setup that was right then runs richer today.'}
      </p>
      <p className="fw-muted fw-small">
        Air density today {formatDensity(today!)}, then {formatDensity(then!)} (moist air, CIPM-2007).
      </p>
    </Callout>
  );
}

function SessionLine({ session, units }: { session: ReferenceSession; units: UnitPreferences }) {
  return (
    <p className="fw-diag-air-session">
      <strong>{formatDay(session.sessionOn)}</strong>: {formatTemperature(session.temperatureC, units.temperature)},{' '}
      {formatPressure(session.stationPressureHpa, units.pressure)}, {formatPercent(session.relativeHumidityPct, { decimals: 0 })} humidity,{' '}
      {formatDensity(session.densityKgM3)}.
    </p>
  );
}

/**
 * "Today's air and fuel" in the intake: today's air, the air on the day the setup was last right
 * (for a kart, its newest jetting-log session that ran right), and the fuel's age. Everything is
 * optional; the machine keeps the text as typed, in the units it was typed in.
 */
export function ConditionsFields({
  draft,
  onChange,
  errorsFor,
  kartId,
}: {
  draft: ConditionsDraft;
  onChange: (draft: ConditionsDraft) => void;
  /** Messages under a request field (`conditions.today.relativeHumidityPct`...). */
  errorsFor: (key: string) => string[];
  /** Case mode: the kart, whose jetting log may give the reference day. */
  kartId: string | null;
}) {
  const user = useCurrentUser();
  const { units, setUnits, saveError } = useUnitPreferences();
  const reference = useReferenceSession(kartId);
  const session = reference.data ?? null;

  // Units switched (here or elsewhere): re-express what was typed, so nothing changes meaning.
  useEffect(() => {
    if (sameUnits(draft.units, units)) return;
    onChange({
      ...draft,
      units,
      today: convertAirForm(draft.today, draft.units, units),
      reference: convertAirForm(draft.reference, draft.units, units),
    });
  }, [draft, units, onChange]);

  // The kart's log gives the reference day: offer it first, unless the racer typed one already.
  useEffect(() => {
    if (!reference.isSuccess || (draft.referenceSession?.sessionId ?? null) === (session?.sessionId ?? null)) return;
    const typed = Object.values(draft.reference).some((v) => v !== 'station' && v !== 'elevation' && v.trim() !== '');
    onChange({ ...draft, referenceSession: session, referenceFrom: session && !typed ? 'log' : 'typed' });
  }, [reference.isSuccess, session, draft, onChange]);

  const fromLog = draft.referenceFrom === 'log' && draft.referenceSession !== null;
  return (
    <div className="fw-diag-air">
      <fieldset className="fw-diag-fieldset">
        <legend className="fw-diag-sublegend">Today</legend>
        <AirReadingFields
          idPrefix="intake-today"
          values={draft.today}
          onChange={(today) => onChange({ ...draft, today })}
          units={units}
          errors={(field) => errorsFor(`conditions.today.${field}`)}
        />
        <TextField
          id="intake-fuel-age"
          label="Days since the fuel was mixed"
          inputMode="numeric"
          autoComplete="off"
          value={draft.fuelAgeDays}
          onChange={(fuelAgeDays) => onChange({ ...draft, fuelAgeDays })}
          errors={errorsFor('conditions.fuelAgeDays')}
          hint="0 if it was mixed today. Premix goes stale with age and can take up water."
        />
      </fieldset>

      <fieldset className="fw-diag-fieldset">
        <legend className="fw-diag-sublegend">The day the setup was last right</legend>
        {draft.referenceSession ? (
          <FormGroup label="Take that day's air from">
            <SegmentedControl
              aria-label="Take that day's air from"
              size="large"
              fill
              options={[
                { value: 'log', label: 'Jetting log' },
                { value: 'typed', label: 'Type it in' },
              ]}
              value={fromLog ? 'log' : 'typed'}
              onValueChange={(v) => onChange({ ...draft, referenceFrom: v as ConditionsDraft['referenceFrom'] })}
            />
          </FormGroup>
        ) : (
          <p className="fw-muted fw-small">
            {kartId && reference.isSuccess
              ? 'No session of this kart ran right in the jetting log yet: type the air of a day it ran right, if you know it.'
              : 'The air of a day it ran right, if you know it: the change since then is what moves the mixture.'}
          </p>
        )}
        {fromLog ? (
          <SessionLine session={draft.referenceSession!} units={units} />
        ) : (
          <AirReadingFields
            idPrefix="intake-reference"
            values={draft.reference}
            onChange={(values) => onChange({ ...draft, reference: values })}
            units={units}
            errors={(field) => errorsFor(`conditions.reference.${field}`)}
          />
        )}
      </fieldset>

      <DensityReadout draft={draft} errors={errorsFor('conditions.densityChangePct')} />

      <details className="fw-diag-air-units">
        <summary>
          Units: {UNIT_SYMBOLS[units.temperature]}, {UNIT_SYMBOLS[units.pressure]}, {UNIT_SYMBOLS[units.length]} (change)
        </summary>
        <UnitsControl idPrefix="intake-units" units={units} onChange={setUnits} />
        {saveError && <p className="fw-field-error">Your units could not be saved: {saveError.message}</p>}
        {!user && <p className="fw-muted fw-small">Your units are kept in this browser.</p>}
      </details>
    </div>
  );
}

/** The fields above as the collapsible "Today's air and fuel (optional)" section of a form step. */
export function AirSection({ open, onToggle, ...fields }: ComponentProps<typeof ConditionsFields> & { open: boolean; onToggle: () => void }) {
  return (
    <Section
      className="fw-diag-section"
      title="Today's air and fuel (optional)"
      subtitle="Air denser or thinner than on the day the setup was right, and old fuel, change what is likely."
      collapsible
      collapseProps={{ isOpen: open, onToggle }}
    >
      <SectionCard>
        <ConditionsFields {...fields} />
      </SectionCard>
    </Section>
  );
}
