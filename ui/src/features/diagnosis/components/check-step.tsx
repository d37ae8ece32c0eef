import { useState, type FormEvent } from 'react';
import { Button, Callout, Collapse, FormGroup, H2, H3, Section, SectionCard, TextArea } from '@blueprintjs/core';
import {
  ArrowLeftIcon,
  ChevronDownIcon,
  ChevronUpIcon,
  CrossCircleIcon,
  DisableIcon,
  ListIcon,
  ShieldIcon,
  StepForwardIcon,
  TickCircleIcon,
  WarningSignIcon,
} from '@blueprintjs/icons';
import { CASE_NOTE_MAX_LENGTH, CHECK_RESULT_LABELS, type CheckResultValue } from '@fuelwright/shared';
import type { WalkThroughSend, WalkThroughSnapshot } from '../hooks/use-walk-through';
import { orderedPlan } from '../machines/walk-through-model';
import { CautionList } from './caution-list';
import { formatMinutes, type CatalogLookup } from './catalog-lookup';

const RESULT_CHOICES: { value: CheckResultValue; intent: 'danger' | 'success' | 'none'; icon: React.JSX.Element }[] = [
  { value: 'fault-found', intent: 'danger', icon: <CrossCircleIcon /> },
  { value: 'looks-fine', intent: 'success', icon: <TickCircleIcon /> },
  { value: 'not-checked', intent: 'none', icon: <DisableIcon /> },
];

/**
 * One check: its cautions first (acknowledged), then its steps, tools, what to write down, and the
 * result. Render it keyed by the check id, so another check starts with a fresh form.
 */
export function CheckStep({ snapshot, send, lookup }: { snapshot: WalkThroughSnapshot; send: WalkThroughSend; lookup: CatalogLookup }) {
  const ctx = snapshot.context;
  const checkId = ctx.currentCheckId ?? '';
  const check = lookup.check(checkId);
  const planStep = ctx.rank?.plan.find((s) => s.checkId === checkId);
  const earlier = ctx.results.find((r) => r.checkId === checkId);
  const inCautions = snapshot.matches({ check: 'cautions' });
  const busy = snapshot.hasTag('busy');
  const group = check ? lookup.group(check.group) : undefined;
  const opensGroup = group !== undefined && group.id !== 'outside';
  const cautions = lookup.checkCautions(checkId, opensGroup);
  const [result, setResult] = useState<CheckResultValue | null>(earlier?.result ?? null);
  const [note, setNote] = useState(earlier?.note ?? '');
  const [showCautions, setShowCautions] = useState(false);
  const [missingResult, setMissingResult] = useState(false);

  if (!check) {
    return (
      <Callout intent="warning" title="This check is not in the catalog any more">
        <Button className="fw-touch" text="Back to the causes" onClick={() => send({ type: 'RANKING.SHOW' })} />
      </Callout>
    );
  }

  const done = ctx.results.filter((r) => r.checkId !== checkId).length;
  const left = orderedPlan(ctx.rank, ctx.skipped).filter((s) => s.checkId !== checkId).length;

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!result) {
      setMissingResult(true);
      return;
    }
    send({ type: 'CHECK.RECORD', result, note });
  };

  const nav = (
    <div className="fw-diag-actions fw-diag-check-nav">
      <Button className="fw-touch" size="large" variant="minimal" icon={<ArrowLeftIcon />} text="Back" disabled={busy} onClick={() => send({ type: 'CHECK.BACK' })} />
      <Button
        className="fw-touch"
        size="large"
        variant="minimal"
        icon={<StepForwardIcon />}
        text="Skip for now"
        disabled={busy || left === 0}
        onClick={() => send({ type: 'CHECK.SKIP' })}
      />
      <Button className="fw-touch" size="large" variant="minimal" icon={<ListIcon />} text="See the causes" disabled={busy} onClick={() => send({ type: 'RANKING.SHOW' })} />
    </div>
  );

  return (
    <div className="fw-diag-step" data-check={checkId}>
      <header className="fw-diag-check-head">
        <p className="fw-diag-check-count fw-muted">
          Check {done + 1}
          {left > 0 ? ` · ${left} more in the plan` : ' · the last one in the plan'}
        </p>
        <H2 className="fw-diag-h2 fw-diag-check-title">{check.label}</H2>
        <p className="fw-diag-plan-meta">
          <span>{formatMinutes(check.minutes)}</span>
          <span aria-hidden="true">·</span>
          <span>{group?.label ?? check.group}</span>
          {planStep && planStep.openingMinutes > 0 && <span className="fw-muted">(+{formatMinutes(planStep.openingMinutes)} to open)</span>}
        </p>
      </header>

      {earlier && (
        <Callout intent="primary" className="fw-diag-earlier">
          Recorded earlier: <strong>{CHECK_RESULT_LABELS[earlier.result]}</strong>
          {earlier.note && ` (${earlier.note})`}. Recording again replaces it.
        </Callout>
      )}

      {inCautions ? (
        <section className="fw-diag-caution-gate" aria-labelledby="cautions-title">
          <H3 id="cautions-title" className="fw-diag-h3">
            <ShieldIcon /> Before you start: read these cautions
          </H3>
          <CautionList cautions={cautions} />
          <p className="fw-muted fw-small">
            Your local rules and the track&apos;s technical inspection come first. If you are unsure about any of this, ask a qualified
            engine builder.
          </p>
          <Button
            className="fw-touch fw-diag-primary"
            intent="primary"
            size="large"
            icon={<TickCircleIcon />}
            text="I have read the cautions: show the steps"
            onClick={() => send({ type: 'CAUTIONS.ACKNOWLEDGE' })}
          />
        </section>
      ) : (
        <>
          {cautions.length > 0 && (
            <Callout className="fw-diag-caution-reminder" intent="warning" icon={<WarningSignIcon />} title="Cautions (read)">
              <span>{cautions.map((c) => c.title).join(' · ')}</span>{' '}
              <Button
                variant="minimal"
                size="small"
                aria-expanded={showCautions}
                endIcon={showCautions ? <ChevronUpIcon /> : <ChevronDownIcon />}
                text={showCautions ? 'Hide' : 'Read again'}
                onClick={() => setShowCautions(!showCautions)}
              />
              <Collapse isOpen={showCautions}>
                <div className="fw-diag-reminder-body">
                  <CautionList cautions={cautions} />
                </div>
              </Collapse>
            </Callout>
          )}

          {opensGroup && group && group.steps.length > 0 && (
            <Section
              className="fw-diag-section"
              compact
              collapsible
              collapseProps={{ defaultIsOpen: (planStep?.openingMinutes ?? 0) > 0 }}
              title={`First: ${group.label.toLowerCase()} (${formatMinutes(group.openingMinutes)})`}
              subtitle="Skip this if it is already open from an earlier check."
            >
              <SectionCard>
                <ol className="fw-diag-steps">
                  {group.steps.map((step) => (
                    <li key={step}>{step}</li>
                  ))}
                </ol>
              </SectionCard>
            </Section>
          )}

          <section aria-labelledby="steps-title">
            <H3 id="steps-title" className="fw-diag-h3">
              Steps
            </H3>
            <ol className="fw-diag-steps">
              {check.steps.map((step) => (
                <li key={step}>{step}</li>
              ))}
            </ol>
          </section>

          <div className="fw-diag-two">
            <section aria-labelledby="tools-title">
              <H3 id="tools-title" className="fw-diag-h3">
                You need
              </H3>
              {check.tools.length > 0 ? (
                <ul className="fw-diag-plain-list">
                  {check.tools.map((tool) => (
                    <li key={tool}>{tool}</li>
                  ))}
                </ul>
              ) : (
                <p className="fw-muted">No tools.</p>
              )}
            </section>
            {check.record.length > 0 && (
              <section aria-labelledby="record-title">
                <H3 id="record-title" className="fw-diag-h3">
                  Write down
                </H3>
                <ul className="fw-diag-plain-list">
                  {check.record.map((item) => (
                    <li key={item}>{item}</li>
                  ))}
                </ul>
              </section>
            )}
          </div>

          <section className="fw-diag-meanings" aria-label="What the results mean">
            <p>
              <strong className="fw-diag-fault">Fault found</strong> means: {check.faultFoundMeans}
            </p>
            <p>
              <strong className="fw-diag-fine">Looks fine</strong> means: {check.looksFineMeans}
            </p>
          </section>

          <form className="fw-diag-record" onSubmit={submit} noValidate aria-label="Record the result">
            <H3 className="fw-diag-h3">What did you find?</H3>
            <div className="fw-diag-result-choices" role="radiogroup" aria-label="Result">
              {RESULT_CHOICES.map((choice) => {
                const on = result === choice.value;
                return (
                  <Button
                    key={choice.value}
                    role="radio"
                    aria-checked={on}
                    className="fw-touch fw-diag-result"
                    size="large"
                    variant={on ? 'solid' : 'outlined'}
                    intent={on ? choice.intent : 'none'}
                    icon={choice.icon}
                    text={CHECK_RESULT_LABELS[choice.value]}
                    onClick={() => {
                      setResult(choice.value);
                      setMissingResult(false);
                    }}
                  />
                );
              })}
            </div>
            {missingResult && (
              <p className="fw-field-error fw-diag-error-text" role="alert">
                Pick what you found first.
              </p>
            )}
            <FormGroup label="Note (optional)" labelFor="check-note" helperText="What you saw or measured, in a few words.">
              <TextArea id="check-note" fill maxLength={CASE_NOTE_MAX_LENGTH} value={note} onChange={(e) => setNote(e.currentTarget.value)} />
            </FormGroup>
            {ctx.error && (
              <Callout intent="danger" role="alert" className="fw-form-error">
                {ctx.error.message}
              </Callout>
            )}
            <Button
              className="fw-touch fw-diag-primary"
              type="submit"
              intent="primary"
              size="large"
              text={earlier ? 'Record again' : 'Record the result'}
              loading={busy}
            />
          </form>
        </>
      )}
      {nav}
    </div>
  );
}
