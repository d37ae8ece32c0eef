import { Button, Checkbox } from '@blueprintjs/core';
import type { CatalogResponse, SymptomDimension, SymptomDto, SymptomReport } from '@fuelwright/shared';
import { CautionList } from './caution-list';

type DetailValues = string[];

const DIMENSION_QUESTIONS: Record<SymptomDimension, string> = {
  band: 'How far open is the throttle when it happens?',
  engine: 'Cold or warm engine?',
  where: 'Where on the track?',
};

function valuesOf(report: SymptomReport, dimension: SymptomDimension): DetailValues {
  const value = report[dimension];
  return value === undefined ? [] : Array.isArray(value) ? [...value] : [value];
}

function optionsFor(catalog: CatalogResponse, dimension: SymptomDimension) {
  if (dimension === 'band') return catalog.throttleBands.map((b) => ({ id: b.id, label: b.label }));
  if (dimension === 'engine') return catalog.engineTemps;
  return catalog.trackPositions;
}

/**
 * The symptoms from the catalog as a list of check boxes; a picked symptom opens its details
 * (throttle, cold or warm, where on track: any that apply) and its own cautions.
 */
export function SymptomPicker({
  catalog,
  value,
  onChange,
  error,
}: {
  catalog: CatalogResponse;
  value: SymptomReport[];
  onChange: (next: SymptomReport[]) => void;
  error?: string;
}) {
  const picked = new Map(value.map((report) => [report.id, report]));

  const toggle = (symptom: SymptomDto, on: boolean) => {
    onChange(on ? [...value, { id: symptom.id }] : value.filter((report) => report.id !== symptom.id));
  };

  const setDetail = (id: string, dimension: SymptomDimension, option: string) => {
    onChange(
      value.map((report) => {
        if (report.id !== id) return report;
        const current = valuesOf(report, dimension);
        const next = current.includes(option) ? current.filter((v) => v !== option) : [...current, option];
        return { ...report, [dimension]: next };
      }),
    );
  };

  return (
    <fieldset className="fw-diag-fieldset" aria-describedby={error ? 'symptoms-error' : undefined}>
      <legend className="fw-diag-legend">What does the engine do?</legend>
      <p className="fw-muted fw-diag-hint">Tick everything you noticed. For each, say when it shows if you know.</p>
      {error && (
        <p id="symptoms-error" className="fw-field-error fw-diag-error-text" role="alert">
          {error}
        </p>
      )}
      <ul className="fw-diag-symptoms">
        {catalog.symptoms.map((symptom) => {
          const report = picked.get(symptom.id);
          return (
            <li key={symptom.id} className={report ? 'fw-diag-symptom fw-diag-symptom-on' : 'fw-diag-symptom'} data-symptom={symptom.id}>
              <Checkbox
                className="fw-diag-symptom-check"
                size="large"
                checked={report !== undefined}
                onChange={(event) => toggle(symptom, event.currentTarget.checked)}
                labelElement={
                  <>
                    <strong>{symptom.label}</strong>
                    <span className="fw-diag-desc fw-muted fw-small">{symptom.description}</span>
                  </>
                }
              />
              {report && (
                <div className="fw-diag-symptom-details">
                  <CautionList cautions={symptom.cautions} />
                  {symptom.dimensions.map((dimension) => {
                    const chosen = valuesOf(report, dimension);
                    const question = DIMENSION_QUESTIONS[dimension];
                    return (
                      <div key={dimension} className="fw-diag-detail" role="group" aria-label={`${symptom.label}: ${question}`}>
                        <span className="fw-diag-detail-question">{question}</span>
                        <div className="fw-diag-chips">
                          {optionsFor(catalog, dimension).map((option) => {
                            const on = chosen.includes(option.id);
                            return (
                              <Button
                                key={option.id}
                                className="fw-diag-chip"
                                variant={on ? 'solid' : 'outlined'}
                                intent={on ? 'primary' : 'none'}
                                aria-pressed={on}
                                text={option.label}
                                onClick={() => setDetail(symptom.id, dimension, option.id)}
                              />
                            );
                          })}
                        </div>
                      </div>
                    );
                  })}
                </div>
              )}
            </li>
          );
        })}
      </ul>
    </fieldset>
  );
}
