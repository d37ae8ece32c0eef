import { useCallback, useEffect, useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, HTMLSelect, Radio, RadioGroup, Section, SectionCard } from '@blueprintjs/core';
import { ArrowRightIcon, PlusIcon } from '@blueprintjs/icons';
import { CARBURETTOR_KIND_LABELS, type CarburettorKind, type KartDto } from '@fuelwright/shared';
import { LinkButton } from '../../../components/link-button';
import { paths } from '../../../app/paths';
import type { WalkThroughSend, WalkThroughSnapshot } from '../hooks/use-walk-through';
import { conditionsDraftEntered, type ConditionsDraft } from '../machines/conditions-draft';
import type { SetupDraftField } from '../machines/walk-through-model';
import type { CatalogLookup } from './catalog-lookup';
import { AirSection } from './conditions-fields';
import { KartFormInline } from './kart-form-inline';
import { SetupFields } from './setup-fields';
import { SymptomPicker } from './symptom-picker';
import { StepErrors } from './step-errors';

const KIND_HELP: Record<CarburettorKind, string> = {
  'pump-around':
    'A fuel pump keeps the float bowl over-full and a return tube takes the extra back to the tank. Foam blocks in the bowl stop the fuel sloshing.',
  'float-valve': 'A float and a small needle valve in the bowl shut the fuel off when the bowl is full.',
};

/** The request fields the air and fuel inputs stand for (a 400 on one of them shows under it). */
const CONDITION_FIELD = /^conditions\.((today|reference)\.(temperatureC|relativeHumidityPct|stationPressureHpa)|fuelAgeDays|densityChangePct)$/;

function formatDay(iso: string): string {
  const date = new Date(`${iso}T12:00:00`);
  return Number.isNaN(date.getTime()) ? iso : date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/** Step 1: what the engine does, and the carburettor and setup it does it with. */
export function IntakeStep({
  snapshot,
  send,
  lookup,
  karts,
}: {
  snapshot: WalkThroughSnapshot;
  send: WalkThroughSend;
  lookup: CatalogLookup;
  /** Case mode: the racer's karts (undefined while loading). */
  karts?: KartDto[];
}) {
  const ctx = snapshot.context;
  const busy = snapshot.hasTag('busy');
  const isCase = ctx.mode === 'case';
  const caseOpen = isCase && ctx.caseId !== null;
  const [addingKart, setAddingKart] = useState(false);
  const serverFields = ctx.error?.status === 400 ? ctx.error.fields : {};
  const fieldErrors = (key: string): string[] => {
    const local = ctx.formErrors[key];
    return local ? [local] : (serverFields[key] ?? []);
  };
  const setupErrors = (field: SetupDraftField) => fieldErrors(`setup.${field}`);
  const placed = new Set([
    'kartId',
    'carburettorKind',
    ...Object.keys(serverFields).filter((k) => k.startsWith('setup.') || CONDITION_FIELD.test(k)),
  ]);
  const otherServerMessages = Object.entries(serverFields)
    .filter(([key]) => !placed.has(key))
    .flatMap(([key, messages]) => messages.map((m) => `${key.startsWith('symptoms') ? 'Symptom' : key}: ${m}`));
  const kart = karts?.find((k) => k.id === ctx.kartId);
  const [setupShown, setSetupShown] = useState(isCase || Object.keys(ctx.setupDraft).length > 0);
  // A message about a setup value opens the setup, so the message is seen.
  const setupHasErrors = [...Object.keys(ctx.formErrors), ...Object.keys(serverFields)].some((k) => k.startsWith('setup.'));
  const setupOpen = setupShown || setupHasErrors;
  // Today's air and fuel: closed until wanted; open when something was typed or a message is there.
  const [airShown, setAirShown] = useState(() => conditionsDraftEntered(ctx.conditionsDraft));
  const airHasErrors = [...Object.keys(ctx.formErrors), ...Object.keys(serverFields)].some((k) => CONDITION_FIELD.test(k));
  const airOpen = airShown || airHasErrors;
  const changeConditions = useCallback((draft: ConditionsDraft) => send({ type: 'INTAKE.CONDITIONS', draft }), [send]);

  // A kart given in the address (?kartId=): take its carburettor and its latest setup once loaded.
  useEffect(() => {
    if (isCase && !caseOpen && kart && ctx.carburettorKind === null && !busy) {
      send({ type: 'INTAKE.KART', kartId: kart.id, carburettorKind: kart.carburettorKind, displacementCc: kart.displacementCc });
    }
  }, [isCase, caseOpen, kart, ctx.carburettorKind, busy, send]);

  const chooseKart = (chosen: KartDto) => {
    send({ type: 'INTAKE.KART', kartId: chosen.id, carburettorKind: chosen.carburettorKind, displacementCc: chosen.displacementCc });
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    send({ type: 'INTAKE.SUBMIT' });
  };

  return (
    <form className="fw-diag-step" onSubmit={submit} noValidate aria-label="Symptoms and setup">
      <StepErrors error={ctx.error} otherMessages={otherServerMessages} />

      {isCase && !caseOpen && (
        <Section className="fw-diag-section" title="Which kart?" compact>
          <SectionCard>
            {karts === undefined ? (
              <p className="fw-muted">Loading your karts…</p>
            ) : karts.length === 0 && !addingKart ? (
              <Callout intent="primary" title="No kart yet">
                Add the kart this is about: a name, the engine size, the drive and the carburettor.
              </Callout>
            ) : (
              !addingKart && (
                <FormGroup
                  label="Kart"
                  labelFor="intake-kart"
                  intent={fieldErrors('kartId').length > 0 ? 'danger' : 'none'}
                  helperText={fieldErrors('kartId')[0] ?? (kart ? CARBURETTOR_KIND_LABELS[kart.carburettorKind] : undefined)}
                >
                  <HTMLSelect
                    id="intake-kart"
                    large
                    fill
                    value={ctx.kartId ?? ''}
                    onChange={(event) => {
                      const chosen = karts.find((k) => k.id === event.currentTarget.value);
                      if (chosen) chooseKart(chosen);
                    }}
                    options={[
                      { value: '', label: 'Pick a kart', disabled: true },
                      ...karts.map((k) => ({ value: k.id, label: `${k.name} · ${k.displacementCc} cc` })),
                    ]}
                  />
                </FormGroup>
              )
            )}
            {addingKart ? (
              <KartFormInline
                onCreated={(created) => {
                  setAddingKart(false);
                  chooseKart(created);
                }}
                onCancel={() => setAddingKart(false)}
              />
            ) : (
              karts !== undefined && (
                <Button className="fw-touch" variant="outlined" icon={<PlusIcon />} text="Add a kart" onClick={() => setAddingKart(true)} />
              )
            )}
          </SectionCard>
        </Section>
      )}

      <SymptomPicker
        catalog={lookup.catalog}
        value={ctx.symptoms}
        onChange={(symptoms) => send({ type: 'INTAKE.SYMPTOMS', symptoms })}
        error={fieldErrors('symptoms')[0]}
      />

      {!isCase && (
        <fieldset className="fw-diag-fieldset">
          <legend className="fw-diag-legend">Which kind of carburettor?</legend>
          {fieldErrors('carburettorKind')[0] && (
            <p className="fw-field-error fw-diag-error-text" role="alert">
              {fieldErrors('carburettorKind')[0]}
            </p>
          )}
          <RadioGroup
            className="fw-diag-radio-cards"
            selectedValue={ctx.carburettorKind ?? undefined}
            onChange={(event) => send({ type: 'INTAKE.CARBURETTOR', carburettorKind: event.currentTarget.value as CarburettorKind })}
          >
            {(Object.keys(CARBURETTOR_KIND_LABELS) as CarburettorKind[]).map((kind) => (
              <Radio
                key={kind}
                size="large"
                value={kind}
                className="fw-diag-radio-card"
                labelElement={
                  <>
                    <strong>{CARBURETTOR_KIND_LABELS[kind]}</strong>
                    <span className="fw-diag-desc fw-muted fw-small">{KIND_HELP[kind]}</span>
                  </>
                }
              />
            ))}
          </RadioGroup>
        </fieldset>
      )}

      {caseOpen ? (
        <p className="fw-muted">
          Only the symptoms change here. To correct the setup or the day's air, use “Correct the setup or today's air” on the
          causes screen.
        </p>
      ) : (
        (!isCase || ctx.kartId) && (
          <>
            <Section
              className="fw-diag-section"
              title={isCase ? 'Setup today' : 'Setup (optional)'}
              subtitle={
                isCase
                  ? ctx.setupFrom
                    ? `Filled in from the setup of ${formatDay(ctx.setupFrom)}. Change anything that is different today.`
                    : 'No setup recorded for this kart yet: fill in what you know.'
                  : 'Fill in what you know; leave the rest empty. It sharpens the ranking.'
              }
              collapsible
              collapseProps={{ isOpen: setupOpen, onToggle: () => setSetupShown(!setupOpen) }}
            >
              <SectionCard>
                <SetupFields
                  draft={ctx.setupDraft}
                  onChange={(field, value) => send({ type: 'INTAKE.SETUP', field, value })}
                  errorsFor={setupErrors}
                  disabled={snapshot.matches({ intake: 'prefilling' })}
                />
              </SectionCard>
            </Section>
            <AirSection
              open={airOpen}
              onToggle={() => setAirShown(!airOpen)}
              draft={ctx.conditionsDraft}
              onChange={changeConditions}
              errorsFor={fieldErrors}
              kartId={isCase ? ctx.kartId : null}
            />
          </>
        )
      )}

      <div className="fw-diag-actions fw-diag-actions-main">
        <Button
          className="fw-touch"
          type="submit"
          intent="primary"
          size="large"
          endIcon={<ArrowRightIcon />}
          text={caseOpen ? 'Rank the causes again' : isCase ? 'Open the case and rank the causes' : 'Show the likely causes'}
          loading={busy && !snapshot.matches({ intake: 'prefilling' })}
          disabled={snapshot.matches({ intake: 'prefilling' })}
        />
        {ctx.rank && (
          <Button className="fw-touch" size="large" variant="minimal" text="Back to the causes" onClick={() => send({ type: 'INTAKE.CANCEL' })} />
        )}
        {isCase && !caseOpen && (
          <LinkButton className="fw-touch" size="large" variant="minimal" to={paths.cases} text="Cancel" />
        )}
      </div>
    </form>
  );
}
