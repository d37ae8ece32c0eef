import { useState } from 'react';
import { Button, Callout, Card, H2, NonIdealState, Radio, RadioGroup } from '@blueprintjs/core';
import { FloppyDiskIcon, WarningSignIcon } from '@blueprintjs/icons';
import { generatePath, useNavigate } from 'react-router-dom';
import { CARBURETTOR_KIND_LABELS, CHECK_RESULT_LABELS, type KartDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { formErrors } from '../../../lib/form-errors';
import { useCatalog } from '../../../lib/catalog';
import { useKarts } from '../api/get-karts';
import { useSaveQuickDiagnosis } from '../hooks/use-save-quick-diagnosis';
import { loadQuickDiagnosis } from '../hooks/walk-through-storage';
import { SETUP_DRAFT_FIELDS, SETUP_FIELD_NAMES } from '../machines/walk-through-model';
import { catalogLookup } from './catalog-lookup';
import { KartFormInline } from './kart-form-inline';
import '../diagnosis.css';

const NEW_KART = '__new';

/** After sign-up: the quick diagnosis kept in this browser becomes a case on one of the racer's karts. */
export function SaveQuickDiagnosisPage() {
  const [quick] = useState(loadQuickDiagnosis);
  const catalog = useCatalog();
  const karts = useKarts();
  const save = useSaveQuickDiagnosis();
  const navigate = useNavigate();
  const [choice, setChoice] = useState<string>('');
  const errors = formErrors(save.error, ['kartId']);

  if (!quick || quick.symptoms.length === 0) {
    return (
      <Page title="Save a quick diagnosis">
        <NonIdealState
          title="Nothing to save"
          description="There is no quick diagnosis kept in this browser (it may have been saved already)."
          action={<LinkButton className="fw-touch" size="large" intent="primary" to={paths.cases} text="Go to your cases" />}
        />
      </Page>
    );
  }
  if (!catalog.data || !karts.data) return <PageSpinner label="Loading your karts" />;
  const lookup = catalogLookup(catalog.data);
  const kartList = karts.data;
  const chosen = kartList.find((k) => k.id === choice);
  const selected = choice === '' && kartList.length === 0 ? NEW_KART : choice;
  const setupText = SETUP_DRAFT_FIELDS.filter((f) => (quick.setupDraft[f] ?? '') !== '').map(
    (f) => `${SETUP_FIELD_NAMES[f]}: ${quick.setupDraft[f]}`,
  );

  const saveOn = (kart: KartDto) =>
    save.mutate(
      { quick, kartId: kart.id },
      { onSuccess: (dto) => navigate(generatePath(paths.caseWalkThrough, { caseId: dto.id }), { replace: true }) },
    );

  return (
    <Page
      narrow
      title={
        <>
          <FloppyDiskIcon size={28} className="fw-title-icon" /> Save the quick diagnosis
        </>
      }
      lead="Pick the kart it is about (or add it): the symptoms, the setup and every result become a case you can come back to."
    >
      <Card className="fw-form-card fw-diag-save-card">
        <H2 className="fw-diag-h2">What will be saved</H2>
        <p className="fw-diag-save-label">Symptoms</p>
        <ul className="fw-diag-plain-list">
          {quick.symptoms.map((s) => (
            <li key={s.id}>{lookup.symptomText(s)}</li>
          ))}
        </ul>
        {setupText.length > 0 && (
          <>
            <p className="fw-diag-save-label">Setup</p>
            <p className="fw-diag-save-value">{setupText.join(' · ')}</p>
          </>
        )}
        {quick.results.length > 0 && (
          <>
            <p className="fw-diag-save-label">Checks done</p>
            <ul className="fw-diag-plain-list">
              {quick.results.map((r) => (
                <li key={r.checkId}>
                  {lookup.checkLabel(r.checkId)}: {CHECK_RESULT_LABELS[r.result]}
                  {r.note && ` (${r.note})`}
                </li>
              ))}
            </ul>
          </>
        )}
        {quick.resolution && (
          <p>
            Fixed: <strong>{lookup.causeLabel(quick.resolution.causeId)}</strong>, {quick.resolution.fix}
          </p>
        )}
      </Card>

      <Card className="fw-form-card">
        <H2 className="fw-diag-h2">Which kart?</H2>
        <RadioGroup className="fw-diag-radio-cards" selectedValue={selected} onChange={(e) => setChoice(e.currentTarget.value)}>
          {[
            ...kartList.map((k) => (
              <Radio
                key={k.id}
                size="large"
                value={k.id}
                className="fw-diag-radio-card"
                labelElement={
                  <>
                    <strong>{k.name}</strong>
                    <span className="fw-diag-desc fw-muted fw-small">
                      {k.displacementCc} cc · {CARBURETTOR_KIND_LABELS[k.carburettorKind]}
                    </span>
                  </>
                }
              />
            )),
            <Radio key={NEW_KART} size="large" value={NEW_KART} className="fw-diag-radio-card" label="A kart not in the list yet" />,
          ]}
        </RadioGroup>
        {chosen && quick.carburettorKind && chosen.carburettorKind !== quick.carburettorKind && (
          <Callout intent="warning" icon={<WarningSignIcon />}>
            This kart has a {CARBURETTOR_KIND_LABELS[chosen.carburettorKind].toLowerCase()}, but the quick diagnosis was for a{' '}
            {CARBURETTOR_KIND_LABELS[quick.carburettorKind].toLowerCase()}. The case is ranked for the kart&apos;s carburettor.
          </Callout>
        )}
        {errors.form && (
          <Callout className="fw-form-error" intent="danger" role="alert">
            {errors.form}
          </Callout>
        )}
        {selected === NEW_KART ? (
          <KartFormInline
            defaultCarburettorKind={quick.carburettorKind}
            onCreated={saveOn}
            submitText="Add the kart and save the case"
            busy={save.isPending}
          />
        ) : (
          <Button
            className="fw-touch fw-diag-primary"
            intent="primary"
            size="large"
            icon={<FloppyDiskIcon />}
            text="Save the case"
            disabled={!chosen}
            loading={save.isPending}
            onClick={() => chosen && saveOn(chosen)}
          />
        )}
      </Card>
    </Page>
  );
}
