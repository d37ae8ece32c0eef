import { Button, Card, H2, NonIdealState, Tag, type Intent } from '@blueprintjs/core';
import { ChatIcon, CameraIcon, ErrorIcon, FolderSharedIcon, PersonIcon } from '@blueprintjs/icons';
import { generatePath, Link } from 'react-router-dom';
import { CASE_STATE_LABELS, SOMETHING_ELSE_ID, type CaseState, type SharedCaseSummaryDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useCatalog } from '../../../lib/catalog';
import { useSharedCases } from '../api/get-shared-cases';
import { formatPercent, formatWhen } from '../lib/format';
import { groupByRacer } from '../lib/group-by-racer';
import '../review.css';

const STATE_INTENTS: Record<CaseState, Intent> = { open: 'primary', resolved: 'success', abandoned: 'none', stopped: 'danger' };

function StateTag({ state }: { state: string }) {
  const known = state in CASE_STATE_LABELS ? (state as CaseState) : null;
  return (
    <Tag round minimal={known !== 'stopped'} intent={known ? STATE_INTENTS[known] : 'none'}>
      {known ? (known === 'stopped' ? 'Stopped' : CASE_STATE_LABELS[known]) : state}
    </Tag>
  );
}

function SharedCaseCard({ c, causeLabel }: { c: SharedCaseSummaryDto; causeLabel: (id: string) => string }) {
  return (
    <li>
      <Card className="fw-shared-case" data-case-id={c.id}>
        <div className="fw-shared-case-head">
          <Link className="fw-shared-case-link fw-break-word" to={generatePath(paths.case, { caseId: c.id })}>
            Case on {c.kartName}
          </Link>
          <StateTag state={c.state} />
        </div>
        <div className="fw-break-word">
          {c.topCauseId ? (
            <>
              Most likely: <strong>{causeLabel(c.topCauseId)}</strong>
              {c.topCauseProbability !== null && <span className="fw-muted"> ({formatPercent(c.topCauseProbability)})</span>}
            </>
          ) : (
            <span className="fw-muted">No ranking yet</span>
          )}
        </div>
        <div className="fw-shared-case-meta fw-small fw-muted">
          <span>
            Last change <time dateTime={c.updatedAt}>{formatWhen(c.updatedAt)}</time>
          </span>
          <span className="fw-nowrap">
            <ChatIcon size={12} /> {c.comments} {c.comments === 1 ? 'comment' : 'comments'}
          </span>
          {c.pendingPhotoRequests > 0 && (
            <Tag minimal round intent="warning" icon={<CameraIcon size={12} />}>
              {c.pendingPhotoRequests} {c.pendingPhotoRequests === 1 ? 'photo' : 'photos'} awaited
            </Tag>
          )}
        </div>
      </Card>
    </li>
  );
}

/**
 * The coach's or shop's dashboard: every case shared with them (directly or through a kart),
 * grouped by racer; open cases first, the newest change first.
 */
export function SharedCasesPage() {
  const cases = useSharedCases();
  const catalog = useCatalog();
  const causes = new Map((catalog.data?.causes ?? []).map((cause) => [cause.id, cause.label]));
  const causeLabel = (id: string) => (id === SOMETHING_ELSE_ID ? (catalog.data?.somethingElse.label ?? 'Something else') : (causes.get(id) ?? id));

  const lead = (
    <>
      Cases your racers share with you: review them, comment, ask for a photo and recommend the next check. You get an e-mail when
      something changes (<Link to={paths.emailSettings}>e-mail settings</Link>).
    </>
  );
  if (cases.isPending) return <PageSpinner label="Loading shared cases" />;
  if (cases.isError) {
    return (
      <Page title="Shared cases" lead={lead}>
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title="The shared cases could not be loaded"
          description={cases.error.message}
          action={<Button size="large" text="Try again" onClick={() => void cases.refetch()} />}
        />
      </Page>
    );
  }
  const groups = groupByRacer(cases.data);
  return (
    <Page
      title={
        <>
          <FolderSharedIcon size={28} className="fw-title-icon" /> Shared cases
        </>
      }
      lead={lead}
    >
      {groups.length === 0 ? (
        <NonIdealState
          icon={<FolderSharedIcon size={48} />}
          title="Nothing shared with you yet"
          description="When a racer shares a case or a kart with your e-mail address, you get an invitation by e-mail. Open its link, and the case shows here."
        />
      ) : (
        groups.map((group) => (
          <section key={group.ownerId} className="fw-racer-group" aria-labelledby={`racer-${group.ownerId}`}>
            <H2 id={`racer-${group.ownerId}`} className="fw-racer-title">
              <PersonIcon size={18} className="fw-muted" />
              <span className="fw-break-word">{group.ownerName}</span>
              <span className="fw-racer-count fw-muted">
                {group.open} open · {group.cases.length} {group.cases.length === 1 ? 'case' : 'cases'}
              </span>
            </H2>
            <ul className="fw-shared-case-list">
              {group.cases.map((c) => (
                <SharedCaseCard key={c.id} c={c} causeLabel={causeLabel} />
              ))}
            </ul>
          </section>
        ))
      )}
    </Page>
  );
}
