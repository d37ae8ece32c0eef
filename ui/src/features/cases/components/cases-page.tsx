import { useEffect, useRef, useState, type ReactNode } from 'react';
import { Button, Card, FormGroup, HTMLSelect, HTMLTable, NonIdealState, Spinner } from '@blueprintjs/core';
import { ArrowDownIcon, ArrowUpIcon, ChevronDownIcon, ChevronUpIcon, DiagnosisIcon, ErrorIcon, FilterIcon, FolderOpenIcon, SwapVerticalIcon } from '@blueprintjs/icons';
import { generatePath, Link, useNavigation, useSearchParams } from 'react-router-dom';
import { CASE_STATES, CASE_STATE_LABELS, type CaseSummaryDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PeriodFilter } from '../../../components/period-filter';
import { periodFromSearch, type PeriodFilter as Period } from '../../../lib/period';
import { useMediaQuery } from '../../../lib/use-media-query';
import { useCases } from '../api/get-cases';
import { useCatalog } from '../../../lib/catalog';
import { useKarts } from '../api/get-karts';
import {
  CASE_SORT_KEYS,
  CASE_SORT_LABELS,
  filterCases,
  firstDirection,
  isCaseState,
  nextSort,
  parseSort,
  sortCases,
  topCauseOptions,
  type CaseListFilter,
  type CaseSort,
  type CaseSortKey,
} from '../lib/case-list';
import { catalogLabels, type CatalogLabels } from '../lib/catalog-labels';
import { formatDate, formatDateTime } from '../lib/format';
import { PHONE_QUERY } from '../lib/phone';
import { CaseStateTag } from './case-state-tag';
import { ProbabilityBar } from './probability-bar';
import '../cases.css';

const casePath = (c: CaseSummaryDto) => generatePath(paths.case, { caseId: c.id });

function symptomsText(c: CaseSummaryDto, labels: CatalogLabels): string {
  if (c.symptomIds.length === 0) return 'No symptoms reported';
  const first = labels.symptom(c.symptomIds[0]);
  return c.symptomIds.length === 1 ? first : `${first} + ${c.symptomIds.length - 1} more`;
}

function TopCause({ c, labels }: { c: CaseSummaryDto; labels: CatalogLabels }) {
  if (!c.topCauseId) return <span className="fw-muted">None yet</span>;
  return <span className="fw-break-word">{labels.cause(c.topCauseId)}</span>;
}

function SortHeader({ sortKey, sort, onSort, className }: { sortKey: CaseSortKey; sort: CaseSort; onSort: (key: CaseSortKey) => void; className?: string }) {
  const active = sort.key === sortKey;
  const Icon = !active ? SwapVerticalIcon : sort.dir === 'asc' ? ArrowUpIcon : ArrowDownIcon;
  return (
    <th scope="col" className={className} aria-sort={active ? (sort.dir === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <Button
        className="fw-sort-button"
        variant="minimal"
        alignText="start"
        endIcon={<Icon className={active ? undefined : 'fw-muted'} />}
        text={CASE_SORT_LABELS[sortKey]}
        onClick={() => onSort(sortKey)}
        aria-label={`Sort by ${CASE_SORT_LABELS[sortKey].toLowerCase()}`}
      />
    </th>
  );
}

function CaseTable({ cases, labels, sort, onSort }: { cases: CaseSummaryDto[]; labels: CatalogLabels; sort: CaseSort; onSort: (key: CaseSortKey) => void }) {
  return (
    <HTMLTable className="fw-data-table fw-cases-table" striped aria-label="Your cases">
      <thead>
        <tr>
          {CASE_SORT_KEYS.map((key) => (
            <SortHeader key={key} sortKey={key} sort={sort} onSort={onSort} className={key === 'probability' ? 'fw-col-probability' : undefined} />
          ))}
        </tr>
      </thead>
      <tbody>
        {cases.map((c) => (
          <tr key={c.id} data-case-id={c.id}>
            <td className="fw-break-word">{c.kartName}</td>
            <td>
              <Link className="fw-strong-link" to={casePath(c)}>
                {symptomsText(c, labels)}
              </Link>
            </td>
            <td className="fw-nowrap">{formatDateTime(c.openedAt)}</td>
            <td>
              <TopCause c={c} labels={labels} />
            </td>
            <td className="fw-col-probability">
              {c.topCauseProbability === null ? <span className="fw-muted">—</span> : <ProbabilityBar probability={c.topCauseProbability} label="probability of the top cause" />}
            </td>
            <td>
              <CaseStateTag state={c.state} />
            </td>
            <td className="fw-nowrap">{formatDateTime(c.updatedAt)}</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}

function CaseCards({ cases, labels }: { cases: CaseSummaryDto[]; labels: CatalogLabels }) {
  return (
    <ul className="fw-card-list" aria-label="Your cases">
      {cases.map((c) => (
        <li key={c.id} data-case-id={c.id}>
          <Card className="fw-case-card">
            <div className="fw-case-card-head">
              <span className="fw-muted fw-break-word">{c.kartName}</span>
              <CaseStateTag state={c.state} />
            </div>
            <Link className="fw-strong-link fw-case-card-link" to={casePath(c)}>
              {symptomsText(c, labels)}
            </Link>
            <div className="fw-case-card-cause">
              <span className="fw-small fw-muted">Top cause</span>
              <TopCause c={c} labels={labels} />
              {c.topCauseProbability !== null && <ProbabilityBar probability={c.topCauseProbability} label="probability of the top cause" />}
            </div>
            <div className="fw-small fw-muted">
              Opened {formatDateTime(c.openedAt)} · last change {formatDateTime(c.updatedAt)}
            </div>
          </Card>
        </li>
      ))}
    </ul>
  );
}

function Filter({ id, label, children, className }: { id: string; label: string; children: ReactNode; className?: string }) {
  return (
    <FormGroup className={className ? `fw-filter ${className}` : 'fw-filter'} label={label} labelFor={id} inline={false}>
      {children}
    </FormGroup>
  );
}

/** What the filters hold, in words, for the "no case matches" message. */
function describeFilters(parts: { state?: string; kart?: string; cause?: string; period: Period }): string {
  const words: string[] = [];
  if (parts.state) words.push(`state “${parts.state}”`);
  if (parts.kart) words.push(`kart “${parts.kart}”`);
  if (parts.cause) words.push(`top cause “${parts.cause}”`);
  const { from, to } = parts.period;
  if (from && to) words.push(`opened ${formatDate(from)} to ${formatDate(to)}`);
  else if (from) words.push(`opened on or after ${formatDate(from)}`);
  else if (to) words.push(`opened on or before ${formatDate(to)}`);
  return words.join(', ');
}

/**
 * The racer's cases: filter by state and kart (on the server), by top cause and opening period (in
 * the page), sort by any column (a card list on a phone). Every filter and the order live in the
 * address, so a reload or a shared link keeps them. On a phone the filters fold behind a "Filters"
 * button (closed unless a filter is set when the page opens) so the first case shows without
 * scrolling; the sort control stays in view.
 */
export function CasesPage() {
  const [params, setParams] = useSearchParams();
  const stateParam = params.get('state');
  const state = isCaseState(stateParam) ? stateParam : undefined;
  const kartId = params.get('kartId') ?? undefined;
  const sort = parseSort(params.get('sort'), params.get('dir'));
  const period = periodFromSearch(params);
  const listFilter: CaseListFilter = { cause: params.get('cause') ?? undefined, from: period.from, to: period.to };
  const cases = useCases({ state, kartId });
  const catalog = useCatalog();
  const karts = useKarts();
  const phone = useMediaQuery(PHONE_QUERY);
  const labels = catalogLabels(catalog.data);

  // A change made while the address still catches up with the one before builds on that one
  // (setParams' own updater would see the address of the last render and drop it).
  const pending = useRef<URLSearchParams | null>(null);
  const navigation = useNavigation();
  useEffect(() => {
    if (navigation.state === 'idle') pending.current = null;
  }, [navigation.state, params]);
  const update = (patch: Record<string, string | undefined>) => {
    const next = new URLSearchParams(pending.current ?? params);
    for (const [key, value] of Object.entries(patch)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    pending.current = next;
    setParams(next, { replace: true });
  };
  const onSort = (key: CaseSortKey) => {
    const next = nextSort(sort, key);
    update({ sort: next.key, dir: next.dir });
  };

  const loaded = cases.data ?? [];
  const list = sortCases(filterCases(loaded, listFilter), sort, labels);
  const activeFilters = [state, kartId, listFilter.cause, listFilter.from, listFilter.to].filter(Boolean).length;
  const filtered = activeFilters > 0;
  // Only read on a phone; decided once, so clearing the filters does not snap the panel shut.
  const [filtersOpen, setFiltersOpen] = useState(filtered);
  const showFilters = !phone || filtersOpen;
  const causeOptions = [{ value: '', label: 'All top causes' }, ...topCauseOptions(loaded, labels, listFilter.cause)];
  const clearAll = () => update({ state: undefined, kartId: undefined, cause: undefined, from: undefined, to: undefined });
  const kartOptions = [
    { value: '', label: 'All karts' },
    ...(karts.data ?? []).map((kart) => ({ value: kart.id, label: kart.name })),
  ];
  // A kart in the address that is not (or no longer) in the list still shows as chosen.
  if (kartId && karts.isSuccess && !kartOptions.some((o) => o.value === kartId)) kartOptions.push({ value: kartId, label: 'Unknown kart' });

  const sortControl = (
    <Filter id="cases-sort" label="Sort by" className="fw-filter-sort">
      <div className="fw-sort-row">
        <HTMLSelect
          id="cases-sort"
          large
          fill
          value={sort.key}
          onChange={(event) => {
            const key = event.currentTarget.value as CaseSortKey;
            update({ sort: key, dir: firstDirection(key) });
          }}
          options={CASE_SORT_KEYS.map((key) => ({ value: key, label: CASE_SORT_LABELS[key] }))}
        />
        <Button
          className="fw-touch"
          size="large"
          icon={sort.dir === 'asc' ? <ArrowUpIcon /> : <ArrowDownIcon />}
          aria-label={sort.dir === 'asc' ? 'Ascending: press for descending' : 'Descending: press for ascending'}
          onClick={() => update({ dir: sort.dir === 'asc' ? 'desc' : 'asc' })}
        />
      </div>
    </Filter>
  );

  return (
    <Page
      title={
        <>
          <FolderOpenIcon size={28} className="fw-title-icon" /> Cases
        </>
      }
      lead="Each running problem you worked through: its likely cause, its checks and how it ended."
      actions={<LinkButton className="fw-touch" size="large" icon={<DiagnosisIcon />} to={paths.diagnoseKart} text="Open a new case" />}
    >
      {(filtered || cases.isPending || loaded.length > 0) && (
        <div className="fw-filters" role="search" aria-label="Filter cases">
          {phone && (
            <Button
              className="fw-touch fw-filters-toggle"
              size="large"
              icon={<FilterIcon />}
              endIcon={filtersOpen ? <ChevronUpIcon /> : <ChevronDownIcon />}
              text={activeFilters > 0 ? `Filters · ${activeFilters}` : 'Filters'}
              aria-expanded={filtersOpen}
              aria-controls="cases-filter-fields"
              onClick={() => setFiltersOpen((open) => !open)}
            />
          )}
          {phone && sortControl}
          {showFilters && (
            <div className="fw-filter-fields" id="cases-filter-fields">
              <Filter id="cases-state" label="State">
                <HTMLSelect
                  id="cases-state"
                  large
                  fill
                  value={state ?? ''}
                  onChange={(event) => update({ state: event.currentTarget.value || undefined })}
                  options={[{ value: '', label: 'All states' }, ...CASE_STATES.map((s) => ({ value: s, label: CASE_STATE_LABELS[s] }))]}
                />
              </Filter>
              <Filter id="cases-kart" label="Kart">
                <HTMLSelect
                  id="cases-kart"
                  large
                  fill
                  value={kartId ?? ''}
                  onChange={(event) => update({ kartId: event.currentTarget.value || undefined })}
                  options={kartOptions}
                />
              </Filter>
              <Filter id="cases-cause" label="Top cause" className="fw-filter-cause">
                <HTMLSelect
                  id="cases-cause"
                  large
                  fill
                  value={listFilter.cause ?? ''}
                  onChange={(event) => update({ cause: event.currentTarget.value || undefined })}
                  options={causeOptions}
                />
              </Filter>
              <div className="fw-filter-period">
                <PeriodFilter value={{ from: period.from, to: period.to }} onChange={(next) => update({ from: next.from, to: next.to })} idPrefix="cases-opened" clearable={false} />
              </div>
              {filtered && (
                <Button className="fw-touch fw-filter-clear" size="large" variant="minimal" text="Clear filters" onClick={clearAll} />
              )}
            </div>
          )}
        </div>
      )}

      {cases.isPending ? (
        <Spinner aria-label="Loading cases" />
      ) : cases.isError ? (
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title="Cases could not be loaded"
          description={cases.error.message}
          action={<Button size="large" text="Try again" onClick={() => void cases.refetch()} />}
        />
      ) : list.length === 0 ? (
        <NonIdealState
          icon={<FolderOpenIcon size={48} />}
          title={filtered ? 'No cases match' : 'No cases yet'}
          description={
            filtered
              ? `No case has ${describeFilters({
                  state: state && CASE_STATE_LABELS[state],
                  kart: kartId && kartOptions.find((o) => o.value === kartId)?.label,
                  cause: listFilter.cause && causeOptions.find((o) => o.value === listFilter.cause)?.label,
                  period,
                })}. Change the filters or show all cases.`
              : 'A case keeps one running problem: what you noticed, the checks you did and what fixed it. Open one from a kart with “Diagnose this kart”.'
          }
          action={
            filtered ? (
              <Button className="fw-touch" size="large" intent="primary" text="Show all cases" onClick={clearAll} />
            ) : (
              <LinkButton className="fw-touch" size="large" intent="primary" to={paths.karts} text="Go to my karts" />
            )
          }
        />
      ) : (
        <>
          <p className="fw-muted fw-small fw-result-count" aria-live="polite">
            {list.length === loaded.length ? (list.length === 1 ? '1 case' : `${list.length} cases`) : `${list.length} of ${loaded.length} cases`}
            {phone ? `, sorted by ${CASE_SORT_LABELS[sort.key].toLowerCase()}` : ''}
            {cases.isPlaceholderData ? ' (updating…)' : ''}
          </p>
          {phone ? <CaseCards cases={list} labels={labels} /> : <CaseTable cases={list} labels={labels} sort={sort} onSort={onSort} />}
        </>
      )}
    </Page>
  );
}
