import { useEffect, useMemo, useRef } from 'react';
import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { ErrorIcon } from '@blueprintjs/icons';
import { CASE_STATE_LABELS, type CatalogResponse, type KartDto } from '@fuelwright/shared';
import { PageSpinner } from '../../../components/page-spinner';
import { useWalkThrough, type UseWalkThroughOptions, type WalkThroughSnapshot } from '../hooks/use-walk-through';
import { catalogLookup } from './catalog-lookup';
import { CheckStep } from './check-step';
import { CorrectFactsStep } from './correct-facts-step';
import { GeneralCaution } from './general-caution';
import { IntakeStep } from './intake-step';
import { RankingStep } from './ranking-step';
import { ResolveStep } from './resolve-step';
import { StopCallout } from './stop-callout';
import { SummaryStep } from './summary-step';
import '../diagnosis.css';

export type Screen = 'loading' | 'failed' | 'intake' | 'ranking' | 'correcting' | 'check' | 'resolve' | 'stopped' | 'summary';

export function screenOf(snapshot: WalkThroughSnapshot): Screen {
  for (const screen of ['failed', 'intake', 'ranking', 'correcting', 'check', 'resolve', 'stopped', 'summary'] as const) {
    if (snapshot.matches(screen)) return screen;
  }
  return 'loading';
}

const STAGES = [
  { id: 'intake', label: 'Symptoms' },
  { id: 'ranking', label: 'Causes' },
  { id: 'check', label: 'Checks' },
  { id: 'end', label: 'Outcome' },
] as const;

function stageOf(screen: Screen): (typeof STAGES)[number]['id'] | null {
  if (screen === 'intake' || screen === 'ranking' || screen === 'check') return screen;
  if (screen === 'correcting') return 'ranking';
  if (screen === 'resolve' || screen === 'stopped' || screen === 'summary') return 'end';
  return null;
}

/** Where the walk-through is: Symptoms > Causes > Checks > Fix. */
function Stages({ screen }: { screen: Screen }) {
  const current = stageOf(screen);
  const index = STAGES.findIndex((s) => s.id === current);
  return (
    <ol className="fw-diag-stages" aria-label="Steps">
      {STAGES.map((stage, i) => (
        <li
          key={stage.id}
          className={i === index ? 'fw-diag-stage fw-diag-stage-current' : i < index ? 'fw-diag-stage fw-diag-stage-done' : 'fw-diag-stage'}
          aria-current={i === index ? 'step' : undefined}
        >
          <span className="fw-diag-stage-number">{i + 1}</span> {stage.label}
        </li>
      ))}
    </ol>
  );
}

/**
 * The guided walk-through on one page, for a quick diagnosis or a saved case: one screen per
 * state of the machine. Scrolls to the top of each new screen (a phone shows one screen at a time).
 */
export function WalkThrough({
  catalog,
  options,
  karts,
  saveTo = null,
  onCaseOpened,
}: {
  catalog: CatalogResponse;
  options: UseWalkThroughOptions;
  karts?: KartDto[];
  saveTo?: string | null;
  /** Case mode, new case: called once the server has opened it. */
  onCaseOpened?: (caseId: string) => void;
}) {
  const { snapshot, send, settling } = useWalkThrough(options);
  const lookup = useMemo(() => catalogLookup(catalog), [catalog]);
  const ctx = snapshot.context;
  const openedCaseId = options.caseId ? null : ctx.caseId;
  // A new case is open: the case's own walk-through page takes over (from the snapshot stored under
  // the case's key). Until it shows, this machine's screens stay hidden, so that nothing is done in
  // a walk-through about to be dropped (the address changes before the next page is drawn).
  const handingOver = openedCaseId !== null && onCaseOpened !== undefined;
  const screen = settling || handingOver ? 'loading' : screenOf(snapshot);
  const top = useRef<HTMLDivElement>(null);
  const place = `${screen}:${ctx.currentCheckId ?? ''}`;
  const firstPlace = useRef(place);

  useEffect(() => {
    if (place === firstPlace.current) return;
    firstPlace.current = '';
    top.current?.scrollIntoView?.({ block: 'start' });
    top.current?.focus({ preventScroll: true });
  }, [place]);

  useEffect(() => {
    if (openedCaseId && onCaseOpened) onCaseOpened(openedCaseId);
  }, [openedCaseId, onCaseOpened]);

  let body: React.JSX.Element;
  switch (screen) {
    case 'loading':
      body = <PageSpinner label={handingOver ? 'Opening the case' : 'Loading the case'} />;
      break;
    case 'failed':
      body = (
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title={ctx.error?.status === 404 ? 'Case not found' : 'Cannot load the case'}
          description={ctx.error?.message}
          action={
            ctx.error?.status === 404 ? undefined : (
              <Button className="fw-touch" size="large" intent="primary" text="Try again" onClick={() => send({ type: 'RETRY' })} />
            )
          }
        />
      );
      break;
    case 'intake':
      body = (
        <>
          <GeneralCaution />
          <IntakeStep snapshot={snapshot} send={send} lookup={lookup} karts={karts} />
        </>
      );
      break;
    case 'ranking':
      body = <RankingStep snapshot={snapshot} send={send} lookup={lookup} />;
      break;
    case 'correcting':
      body = <CorrectFactsStep snapshot={snapshot} send={send} />;
      break;
    case 'check':
      body = <CheckStep key={ctx.currentCheckId ?? ''} snapshot={snapshot} send={send} lookup={lookup} />;
      break;
    case 'resolve':
      body = <ResolveStep snapshot={snapshot} send={send} lookup={lookup} />;
      break;
    case 'stopped':
      body = (
        <div className="fw-diag-step">
          {ctx.stop && <StopCallout stop={ctx.stop} checkLabel={lookup.checkLabel(ctx.stop.checkId)} />}
          {ctx.mode === 'case' && <p className="fw-muted">The case is closed as stopped; every result stays on record.</p>}
          <div className="fw-diag-actions fw-diag-actions-main">
            <Button className="fw-touch fw-diag-primary" size="large" intent="danger" text="I understand" onClick={() => send({ type: 'STOP.ACKNOWLEDGE' })} />
          </div>
        </div>
      );
      break;
    case 'summary':
      body = <SummaryStep snapshot={snapshot} send={send} lookup={lookup} saveTo={saveTo} />;
      break;
  }

  return (
    <div className="fw-diag" data-screen={screen} data-state={JSON.stringify(snapshot.value)}>
      <div ref={top} tabIndex={-1} className="fw-diag-top">
        {ctx.kartName && (
          <p className="fw-diag-case-line">
            Case on <strong>{ctx.kartName}</strong>
            {ctx.caseState && ctx.caseState !== 'open' && <span className="fw-muted"> · {CASE_STATE_LABELS[ctx.caseState]}</span>}
          </p>
        )}
        <Stages screen={screen} />
      </div>
      {ctx.notice && screen !== 'summary' && (
        <Callout intent="warning" className="fw-diag-notice">
          {ctx.notice}{' '}
          <Button variant="minimal" size="small" text="OK" onClick={() => send({ type: 'ERROR.DISMISS' })} />
        </Callout>
      )}
      {body}
    </div>
  );
}
