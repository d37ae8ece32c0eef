import { useState, type ComponentType, type ReactNode } from 'react';
import { Button, Callout, Card, H2, NonIdealState, Tag, type Intent } from '@blueprintjs/core';
import { ArrowDownIcon, ArrowUpIcon, DisableIcon, EndorsedIcon, ErrorIcon, FolderOpenIcon, PlayIcon, ThumbsUpIcon } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { generatePath, Link, useParams } from 'react-router-dom';
import {
  CHECK_RESULT_LABELS,
  ENGINE_TEMP_LABELS,
  THROTTLE_BAND_INFO,
  TRACK_POSITION_LABELS,
  type CaseDto,
  type CheckResultValue,
  type RankedCause,
  type SymptomReport,
} from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { CautionCallout } from '../../../components/caution-callout';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { isApiError } from '../../../lib/api-client';
import { useCurrentUser } from '../../../lib/current-user';
import { formatSetupValue, SETUP_FIELD_LABELS } from '../../../lib/setup-fields';
import { caseQueryKey, useCase } from '../api/get-case';
import { useCatalog } from '../../../lib/catalog';
import { catalogLabels, type CatalogLabels } from '../lib/catalog-labels';
import { conditionLines } from '../lib/conditions';
import { formatDateTime } from '../lib/format';
import { AbandonCaseDialog } from './abandon-case-dialog';
import { CaseStateTag } from './case-state-tag';
import { CaseTimeline } from './case-timeline';
import { ProbabilityBar } from './probability-bar';
import '../cases.css';

const SHOWN_CAUSES = 5;
const SHOWN_REASONS = 4;
const SETUP_ORDER = [
  'carburettorKind',
  'mainJet',
  'pilotJet',
  'needleClipGroove',
  'airScrewTurnsOut',
  'idleScrew',
  'idleScrewTurns',
  'premixRatio',
  'foamFittedDate',
  'lastRebuildDate',
  'ventLinesFitted',
  'ventLinesRoutedUp',
] as const;

const RESULT_INTENTS: Record<CheckResultValue, Intent> = { 'fault-found': 'warning', 'looks-fine': 'success', 'not-checked': 'none' };

const list = <T extends string>(value: T | T[] | undefined): T[] => (value === undefined ? [] : Array.isArray(value) ? value : [value]);

function Panel({ id, title, children, className }: { id: string; title: ReactNode; children: ReactNode; className?: string }) {
  return (
    <Card className={className ? `fw-panel ${className}` : 'fw-panel'} aria-labelledby={id} role="region">
      <H2 id={id} className="fw-panel-title">
        {title}
      </H2>
      {children}
    </Card>
  );
}

function SymptomItem({ symptom, labels }: { symptom: SymptomReport; labels: CatalogLabels }) {
  const details = [
    ...list(symptom.band).map((band) => THROTTLE_BAND_INFO[band]?.label ?? band),
    ...list(symptom.engine).map((engine) => ENGINE_TEMP_LABELS[engine] ?? engine),
    ...list(symptom.where).map((where) => TRACK_POSITION_LABELS[where] ?? where),
  ];
  return (
    <li>
      <strong className="fw-break-word">{labels.symptom(symptom.id)}</strong>
      {details.length > 0 ? (
        <div className="fw-tag-row">
          {details.map((detail) => (
            <Tag key={detail} minimal round>
              {detail}
            </Tag>
          ))}
        </div>
      ) : (
        <div className="fw-small fw-muted">Where and when it shows: not given</div>
      )}
    </li>
  );
}

function CauseItem({ cause, labels }: { cause: RankedCause; labels: CatalogLabels }) {
  const shown = cause.reasons.slice(0, SHOWN_REASONS);
  return (
    <li className="fw-cause">
      <div className="fw-cause-head">
        <span className="fw-cause-label fw-break-word">{labels.cause(cause.id) || cause.label}</span>
        <ProbabilityBar probability={cause.probability} strong />
      </div>
      {shown.length > 0 && (
        <ul className="fw-reasons">
          {shown.map((reason, index) => (
            <li key={`${reason.ruleId ?? reason.checkId ?? reason.symptomId ?? ''}-${index}`}>
              {reason.likelihoodRatio >= 1 ? (
                <ArrowUpIcon size={12} className="fw-reason-up" aria-label="makes it more likely:" />
              ) : (
                <ArrowDownIcon size={12} className="fw-reason-down" aria-label="makes it less likely:" />
              )}{' '}
              <span className="fw-break-word">{reason.text}</span>
            </li>
          ))}
          {cause.reasons.length > shown.length && (
            <li className="fw-muted">
              and {cause.reasons.length - shown.length} smaller {cause.reasons.length - shown.length === 1 ? 'reason' : 'reasons'}
            </li>
          )}
        </ul>
      )}
    </li>
  );
}

function Ranking({ c, labels }: { c: CaseDto; labels: CatalogLabels }) {
  const [all, setAll] = useState(false);
  const causes = all ? c.rank.causes : c.rank.causes.slice(0, SHOWN_CAUSES);
  return (
    <>
      <ol className="fw-causes">
        {causes.map((cause) => (
          <CauseItem key={cause.id} cause={cause} labels={labels} />
        ))}
        <li className="fw-cause">
          <div className="fw-cause-head">
            <span className="fw-cause-label fw-muted">{c.rank.somethingElse.label}</span>
            <ProbabilityBar probability={c.rank.somethingElse.probability} />
          </div>
        </li>
      </ol>
      {c.rank.causes.length > SHOWN_CAUSES && (
        <Button
          className="fw-touch"
          variant="minimal"
          text={all ? 'Show the top causes only' : `Show all ${c.rank.causes.length} causes`}
          onClick={() => setAll((shown) => !shown)}
        />
      )}
    </>
  );
}

function Outcome({ c, labels, actor }: { c: CaseDto; labels: CatalogLabels; actor: (id: string) => string }) {
  if (c.state === 'stopped' && c.stop) {
    return (
      <CautionCallout kind="stop" title="Stop: do not drive">
        <p className="fw-callout-text">{c.stop.reason}</p>
        <p className="fw-callout-text fw-small">Found by the check “{labels.check(c.stop.checkId)}”.</p>
      </CautionCallout>
    );
  }
  if (c.state === 'resolved' && c.resolution) {
    const r = c.resolution;
    return (
      <Callout intent="success" icon={<EndorsedIcon size={20} />} title="Resolved">
        <p className="fw-callout-text">
          Cause: <strong>{labels.cause(r.causeId)}</strong>
        </p>
        <p className="fw-callout-text">
          Fixed by: <strong className="fw-break-word">{r.fix}</strong>
        </p>
        {r.note && <p className="fw-callout-text fw-break-word">{r.note}</p>}
        <p className="fw-callout-text fw-small fw-muted">
          {actor(r.by)} · {formatDateTime(r.at)}
        </p>
      </Callout>
    );
  }
  if (c.state === 'abandoned') {
    return (
      <Callout intent="none" icon={<DisableIcon size={20} />} title="Abandoned">
        <p className="fw-callout-text fw-break-word">{c.abandonedReason || 'No reason given.'}</p>
      </Callout>
    );
  }
  return null;
}

function SetupAtTheTime({ c }: { c: CaseDto }) {
  const rows = SETUP_ORDER.map((field) => ({ field, value: formatSetupValue(field, c.setup) })).filter((row) => row.value !== null);
  if (rows.length === 0) return <p className="fw-muted">No setup was recorded for this kart when the case was opened.</p>;
  return (
    <dl className="fw-case-facts">
      {rows.map((row) => (
        <div key={row.field}>
          <dt>{SETUP_FIELD_LABELS[row.field]}</dt>
          <dd>{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** What the case page hands to the review panels the app gives it (comments, photos, sharing). */
export interface CaseReviewSlotProps {
  c: CaseDto;
  checkLabel: (checkId: string) => string;
  onCase: (c: CaseDto) => void;
}

/** What the case page hands to the outcome panel the app gives it. */
export interface CaseOutcomeSlotProps {
  c: CaseDto;
}

/**
 * One case: what was noticed, the setup and conditions, the ranking now, every check, how it ended,
 * and the timeline. Only the owner changes the facts; a coach or shop it is shared with reads them.
 */
export function CasePage({
  review: Review,
  logOutcome: LogOutcome,
}: {
  review?: ComponentType<CaseReviewSlotProps>;
  /** The "log what really fixed it" panel the app gives the page (it decides who sees it). */
  logOutcome?: ComponentType<CaseOutcomeSlotProps>;
}) {
  const { caseId = '' } = useParams();
  const viewer = useCurrentUser();
  const queryClient = useQueryClient();
  const query = useCase(caseId);
  const catalog = useCatalog();
  const [abandoning, setAbandoning] = useState(false);
  const labels = catalogLabels(catalog.data);

  if (query.isPending) return <PageSpinner label="Loading the case" />;
  if (query.isError) {
    const missing = isApiError(query.error) && query.error.status === 404;
    return (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title={missing ? 'Case not found' : 'The case could not be loaded'}
        description={missing ? 'It may belong to someone else, or its kart was deleted.' : query.error.message}
        action={
          missing ? (
            viewer?.role === 'coach' || viewer?.role === 'shop' ? (
              <LinkButton className="fw-touch" size="large" to={paths.sharedCases} text="Back to shared cases" />
            ) : (
              // Any account may have cases shared with it, and lose access to one: offer both lists.
              <div className="fw-not-found-actions">
                <LinkButton className="fw-touch" size="large" to={paths.cases} text="Back to cases" />
                <LinkButton className="fw-touch" size="large" variant="minimal" to={paths.sharedCases} text="Back to shared cases" />
              </div>
            )
          ) : (
            <Button size="large" text="Try again" onClick={() => void query.refetch()} />
          )
        }
      />
    );
  }

  const c = query.data;
  const open = c.state === 'open';
  const owner = viewer?.id === c.ownerId;
  const names = new Map(c.events.filter((e) => e.actorId).map((e) => [e.actorId!, e.actorName]));
  const actor = (id: string) => names.get(id) ?? 'Someone';
  const nextCheck = open ? c.rank.plan[0] : undefined;
  const conditions = conditionLines(c.conditions);

  return (
    <Page
      title={
        <>
          <FolderOpenIcon size={28} className="fw-title-icon" /> <span className="fw-break-word">Case on {c.kartName}</span>
        </>
      }
      lead={
        <span className="fw-case-lead">
          <CaseStateTag state={c.state} long /> <span>Opened {formatDateTime(c.openedAt)} · last change {formatDateTime(c.updatedAt)}</span>
        </span>
      }
      actions={
        open && owner ? (
          <>
            <LinkButton
              className="fw-touch"
              size="large"
              intent="primary"
              icon={<PlayIcon />}
              to={generatePath(paths.caseWalkThrough, { caseId: c.id })}
              text="Continue the walk-through"
            />
            <Button className="fw-touch" size="large" variant="outlined" icon={<DisableIcon />} text="Abandon" onClick={() => setAbandoning(true)} />
          </>
        ) : undefined
      }
    >
      {owner ? (
        <p className="fw-back-link">
          <Link to={paths.cases}>← Cases</Link> ·{' '}
          <Link to={generatePath(paths.kart, { kartId: c.kartId })}>{c.kartName}</Link>
        </p>
      ) : (
        <p className="fw-back-link">
          <Link to={paths.sharedCases}>← Shared cases</Link> · {c.ownerName}’s case, shared with you to review: you cannot change its facts.
        </p>
      )}
      <Outcome c={c} labels={labels} actor={actor} />
      {open && c.rank.cautions.map((caution) => (
        <CautionCallout key={caution.id} kind={caution.severity} title={`${caution.severity === 'stop' ? 'Stop' : 'Caution'}: ${caution.title}`}>
          {caution.text}
        </CautionCallout>
      ))}
      {nextCheck && (
        <p className="fw-next-check">
          Next check: <strong>{labels.check(nextCheck.checkId) || nextCheck.label}</strong>{' '}
          <span className="fw-muted">
            (about {nextCheck.minutes + nextCheck.openingMinutes} min; {c.rank.plan.length} {c.rank.plan.length === 1 ? 'check' : 'checks'} in the plan)
          </span>
        </p>
      )}
      {nextCheck?.recommendation && (
        <Callout intent="primary" icon={<ThumbsUpIcon size={20} />} compact>
          <span className="fw-break-word">
            Recommended by <strong>{nextCheck.recommendation.byName}</strong>: {nextCheck.recommendation.reason}
          </span>
        </Callout>
      )}
      {LogOutcome && <LogOutcome c={c} />}

      <div className="fw-case-grid">
        <div className="fw-case-column">
          <Panel id="case-ranking" className="fw-order-2" title={open ? 'Likely causes now' : 'Likely causes at the end'}>
            <p className="fw-muted fw-small fw-panel-lead">Probability of each cause after every step so far, with the reasons behind it.</p>
            <Ranking c={c} labels={labels} />
          </Panel>
          <Panel id="case-checks" className="fw-order-3" title="Checks done">
            {c.results.length === 0 ? (
              <p className="fw-muted">No checks recorded yet.</p>
            ) : (
              <ol className="fw-results">
                {c.results.map((result) => (
                  <li key={`${result.checkId}-${result.at}`}>
                    <div className="fw-result-head">
                      <strong className="fw-break-word">{labels.check(result.checkId)}</strong>
                      <Tag round minimal={result.result !== 'fault-found'} intent={RESULT_INTENTS[result.result]}>
                        {CHECK_RESULT_LABELS[result.result]}
                      </Tag>
                    </div>
                    {result.note && <div className="fw-break-word">“{result.note}”</div>}
                    <div className="fw-small fw-muted">
                      {actor(result.by)} · <time dateTime={result.at}>{formatDateTime(result.at)}</time>
                    </div>
                  </li>
                ))}
              </ol>
            )}
          </Panel>
          <Panel id="case-timeline" className="fw-order-4" title="Timeline">
            <CaseTimeline events={c.events} labels={labels} />
          </Panel>
        </div>
        <div className="fw-case-column">
          <Panel id="case-symptoms" className="fw-order-1" title="Symptoms">
            <ul className="fw-symptoms">
              {c.symptoms.map((symptom) => (
                <SymptomItem key={symptom.id} symptom={symptom} labels={labels} />
              ))}
            </ul>
            {c.symptoms.length === 0 && <p className="fw-muted">No symptoms reported.</p>}
          </Panel>
          <Panel id="case-setup" className="fw-order-5" title="Setup at the time">
            <SetupAtTheTime c={c} />
          </Panel>
          <Panel id="case-conditions" className="fw-order-6" title="Conditions">
            {conditions.length === 0 ? (
              <p className="fw-muted">No weather or fuel details were given.</p>
            ) : (
              <dl className="fw-case-facts">
                {conditions.map((line) => (
                  <div key={line.label} className="fw-case-facts-wide">
                    <dt>{line.label}</dt>
                    <dd>{line.value}</dd>
                  </div>
                ))}
              </dl>
            )}
          </Panel>
          <p className="fw-small fw-muted fw-order-7">
            Ranked with ruleset version <strong>{c.rulesetVersion}</strong>. Causes ruled out for this carburettor:{' '}
            {c.rank.excluded.length === 0 ? 'none' : c.rank.excluded.map((e) => labels.cause(e.id)).join(', ')}.
          </p>
        </div>
      </div>
      {Review && (
        <Review
          c={c}
          checkLabel={labels.check}
          onCase={(changed) => queryClient.setQueryData(caseQueryKey(changed.id), changed)}
        />
      )}
      {open && owner && <AbandonCaseDialog caseId={c.id} isOpen={abandoning} onClose={() => setAbandoning(false)} />}
    </Page>
  );
}
