import { useState, type ReactNode } from 'react';
import { AnchorButton, Button, Callout, Card, H2, HTMLTable, NonIdealState, SegmentedControl, Tag } from '@blueprintjs/core';
import { ChartIcon, DownloadIcon, ErrorIcon, LightbulbIcon } from '@blueprintjs/icons';
import { useSearchParams } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { PeriodFilter } from '../../../components/period-filter';
import { useCatalog } from '../../../lib/catalog';
import { useInsights, type InsightsResponse } from '../api/get-insights';
import { useRulesets } from '../../../lib/rulesets';
import {
  formatCount,
  formatMinutes,
  formatPercent,
  formatScore,
  insightsCsvHref,
  labelsFrom,
  outcomesCsvHref,
  reliabilityPoints,
  ruleLabel,
  type InsightTable,
  type Labels,
} from '../lib/format';
import { periodFromSearch, periodQueryString, type PeriodFilter as Filter } from '../../../lib/period';
import { ReliabilityChart } from './reliability-chart';
import '../insights.css';

function Panel({ id, title, csv, children }: { id: string; title: ReactNode; csv?: string; children: ReactNode }) {
  return (
    <Card className="fw-ins-panel" role="region" aria-labelledby={id}>
      <div className="fw-ins-panel-head">
        <H2 id={id} className="fw-ins-panel-title">
          {title}
        </H2>
        {csv && <AnchorButton className="fw-touch" variant="minimal" icon={<DownloadIcon />} href={csv} download text="CSV" aria-label={`Download ${title} as CSV`} />}
      </div>
      {children}
    </Card>
  );
}

function Stat({ label, value, note }: { label: string; value: ReactNode; note?: ReactNode }) {
  return (
    <div className="fw-ins-stat">
      <dt>{label}</dt>
      <dd>
        <span className="fw-ins-stat-value">{value}</span>
        {note && <span className="fw-ins-stat-note fw-muted fw-small">{note}</span>}
      </dd>
    </div>
  );
}

/** A share as a bar with its number (the number is what screen readers read). */
function ShareBar({ value }: { value: number }) {
  const pct = Math.max(0, Math.min(100, value * 100));
  return (
    <span className="fw-ins-bar">
      <span className="fw-ins-bar-track" aria-hidden="true">
        <span className="fw-ins-bar-fill" style={{ width: `${pct}%` }} />
      </span>
      <span className="fw-ins-bar-number">{formatPercent(value)}</span>
    </span>
  );
}

function Accuracy({ data }: { data: InsightsResponse }) {
  const a = data.insights.accuracy;
  return (
    <dl className="fw-ins-stats">
      <Stat label="Top cause right (top-1)" value={<ShareBar value={a.top1Rate} />} note={`${formatCount(a.top1)} of ${formatCount(a.ranked)}`} />
      <Stat label="Right cause in the top three (top-3)" value={<ShareBar value={a.top3Rate} />} note={`${formatCount(a.top3)} of ${formatCount(a.ranked)}`} />
      <Stat label="Brier score" value={formatScore(a.brier)} note="0 is certain and right, 2 certain and wrong; lower is better" />
      <Stat
        label="Calibration error"
        value={formatPercent(data.insights.calibration.expectedCalibrationError, 1)}
        note="mean gap between predicted and observed, weighted by predictions"
      />
    </dl>
  );
}

function Calibration({ data }: { data: InsightsResponse }) {
  const [topOnly, setTopOnly] = useState(false);
  const calibration = topOnly ? data.insights.topLabelCalibration : data.insights.calibration;
  const points = reliabilityPoints(calibration);
  return (
    <>
      <SegmentedControl
        aria-label="Predictions shown"
        size="large"
        className="fw-ins-scope"
        options={[
          { value: 'all', label: 'Every cause listed' },
          { value: 'top', label: 'Top cause only' },
        ]}
        value={topOnly ? 'top' : 'all'}
        onValueChange={(v) => setTopOnly(v === 'top')}
      />
      {points.length === 0 ? <p className="fw-muted">No rankings to plot in this period.</p> : <ReliabilityChart points={points} topOnly={topOnly} />}
      <details className="fw-ins-details">
        <summary>The numbers behind the chart</summary>
        <div className="fw-ins-scroll">
          <HTMLTable compact striped className="fw-ins-table">
            <thead>
              <tr>
                <th scope="col">Predicted</th>
                <th scope="col" className="fw-ins-num">
                  Predictions
                </th>
                <th scope="col" className="fw-ins-num">
                  Mean predicted
                </th>
                <th scope="col" className="fw-ins-num">
                  Observed
                </th>
              </tr>
            </thead>
            <tbody>
              {calibration.bins.map((b) => (
                <tr key={b.from}>
                  <td className="fw-nowrap">
                    {formatPercent(b.from)}–{formatPercent(b.to)}
                  </td>
                  <td className="fw-ins-num">{formatCount(b.count)}</td>
                  <td className="fw-ins-num">{formatPercent(b.meanPredicted, 1)}</td>
                  <td className="fw-ins-num">{formatPercent(b.observed, 1)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      </details>
    </>
  );
}

/** The first rows of a long table, and a button for the rest. */
const FIRST_ROWS = 10;
function useFirstRows<T>(rows: readonly T[]): { shown: readonly T[]; more: ReactNode } {
  const [all, setAll] = useState(false);
  const hidden = all ? 0 : Math.max(0, rows.length - FIRST_ROWS);
  return {
    shown: hidden ? rows.slice(0, FIRST_ROWS) : rows,
    more: hidden ? <Button className="fw-touch" variant="outlined" text={`Show all ${rows.length}`} onClick={() => setAll(true)} /> : null,
  };
}

function Pairs({ data, labels }: { data: InsightsResponse; labels: Labels }) {
  const pairs = data.insights.symptomCausePairs;
  const { shown, more } = useFirstRows(pairs);
  if (pairs.length === 0) return <p className="fw-muted">No outcomes in this period.</p>;
  return (
    <div className="fw-ins-scroll">
      <HTMLTable compact striped className="fw-ins-table">
        <thead>
          <tr>
            <th scope="col">Symptom → confirmed cause</th>
            <th scope="col" className="fw-ins-num">
              Outcomes
            </th>
            <th scope="col" className="fw-ins-share-col">
              Share of the symptom’s outcomes
            </th>
          </tr>
        </thead>
        <tbody>
          {shown.map((p) => (
            <tr key={`${p.symptom}|${p.cause}`}>
              <td className="fw-break-word">
                {labels.symptom(p.symptom)} <span className="fw-muted">→</span> <strong>{labels.cause(p.cause)}</strong>
              </td>
              <td className="fw-ins-num">{formatCount(p.outcomes)}</td>
              <td>
                <ShareBar value={p.shareOfSymptom} />
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      {more}
    </div>
  );
}

function Labour({ data, labels }: { data: InsightsResponse; labels: Labels }) {
  const rows = data.insights.labourByCause;
  if (rows.length === 0) return <p className="fw-muted">No labour minutes logged in this period.</p>;
  return (
    <div className="fw-ins-scroll">
      <HTMLTable compact striped className="fw-ins-table">
        <thead>
          <tr>
            <th scope="col">Cause</th>
            <th scope="col" className="fw-ins-num">
              Outcomes
            </th>
            <th scope="col" className="fw-ins-num">
              Mean
            </th>
            <th scope="col" className="fw-ins-num fw-hide-on-phone">
              Spread (sd)
            </th>
            <th scope="col" className="fw-ins-num fw-hide-on-phone">
              Shortest–longest
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.cause}>
              <td className="fw-break-word">{labels.cause(r.cause)}</td>
              <td className="fw-ins-num">{formatCount(r.outcomes)}</td>
              <td className="fw-ins-num fw-nowrap">{formatMinutes(r.meanMinutes)}</td>
              <td className="fw-ins-num fw-nowrap fw-hide-on-phone">{r.sdMinutes === null ? '—' : `± ${formatMinutes(r.sdMinutes)}`}</td>
              <td className="fw-ins-num fw-nowrap fw-hide-on-phone">
                {r.minMinutes}–{r.maxMinutes} min
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}

function WrongWay({ data, labels }: { data: InsightsResponse; labels: Labels }) {
  const { rules, unknownRuleFirings } = data.insights.wrongWayRules;
  const { shown, more } = useFirstRows(rules);
  if (rules.length === 0) return <p className="fw-muted">No rule pointed the wrong way in this period (or no rule fired).</p>;
  return (
    <>
      <p className="fw-muted fw-small fw-ins-lead">
        A rule for a cause that fired when the cause was not confirmed, or a rule against a cause that fired when it was. Many wrong-way
        firings with a high rate make a rule a candidate for a smaller weight.
      </p>
      <div className="fw-ins-scroll">
        <HTMLTable compact striped className="fw-ins-table">
          <thead>
            <tr>
              <th scope="col">Rule and its cause</th>
              <th scope="col" className="fw-ins-num">
                Wrong way
              </th>
              <th scope="col" className="fw-hide-on-phone">
                Rate
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => (
              <tr key={r.rule}>
                <td className="fw-break-word">
                  <strong>{ruleLabel(r.rule, labels)}</strong>
                  <div className="fw-small">
                    {r.direction === 'for' ? 'raises' : 'lowers'} {labels.cause(r.cause)} (ratio {r.lr})
                  </div>
                  <code className="fw-ins-rule fw-muted fw-hide-on-phone">{r.rule}</code>
                </td>
                <td className="fw-ins-num fw-nowrap">
                  {formatCount(r.wrongWay)} <span className="fw-muted fw-small">of {formatCount(r.fired)}</span>
                  <div className="fw-ins-phone-only">{formatPercent(r.wrongWayRate)}</div>
                </td>
                <td className="fw-hide-on-phone">
                  <ShareBar value={r.wrongWayRate} />
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      {more}
      {unknownRuleFirings > 0 && <p className="fw-muted fw-small">{formatCount(unknownRuleFirings)} firings of rules this version does not know were left out.</p>}
    </>
  );
}

/** Shop and admin: how good the ranking was, for a period and a ruleset version. */
export function InsightsPage() {
  const [params, setParams] = useSearchParams();
  const filter = periodFromSearch(params);
  const insights = useInsights(filter);
  const versions = useRulesets();
  const catalog = useCatalog();
  const labels = labelsFrom(catalog.data);
  const setFilter = (next: Filter) => setParams(periodQueryString(next), { replace: true });
  const active = versions.data?.active;

  let body;
  if (insights.isPending) body = <PageSpinner label="Computing the insights" />;
  else if (insights.isError)
    body = (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title="Insights could not be computed"
        description={insights.error.message}
        action={<Button size="large" text="Try again" onClick={() => void insights.refetch()} />}
      />
    );
  else {
    const data = insights.data;
    const i = data.insights;
    body = (
      <div className={insights.isPlaceholderData ? 'fw-ins-body fw-ins-stale' : 'fw-ins-body'} aria-busy={insights.isFetching}>
        <p className="fw-ins-version" role="status">
          Ruleset version <Tag round>{data.version}</Tag>
          {data.version === active && (
            <Tag round minimal intent="success">
              active
            </Tag>
          )}{' '}
          <span className="fw-muted">
            · {data.from || data.to ? `${data.from ?? 'the start'} to ${data.to ?? 'today'}` : 'all dates'}
          </span>
        </p>
        <Panel id="ins-counts" title="Counts">
          <dl className="fw-ins-stats">
            <Stat label="Cases opened" value={formatCount(data.cases)} />
            <Stat label="Outcomes" value={formatCount(data.outcomes)} note={`${formatCount(i.withCase)} on cases, ${formatCount(i.walkIns)} walk-ins`} />
            <Stat label="Ranked at the start" value={formatCount(i.ranked)} note={i.skipped ? `${formatCount(i.skipped)} left out: no known cause` : undefined} />
            <Stat
              label="Still fixed after the next session"
              value={formatCount(i.stillFixed.yes)}
              note={`${formatCount(i.stillFixed.no)} came back, ${formatCount(i.stillFixed.unknown)} not known`}
            />
          </dl>
        </Panel>
        {i.ranked === 0 ? (
          <Callout intent="primary" icon={<LightbulbIcon size={20} />} title="No outcomes to measure yet">
            Accuracy and calibration appear once outcomes are logged on cases and work orders ranked under this version.
          </Callout>
        ) : (
          <>
            <Panel id="ins-accuracy" title="How often the ranking was right">
              <Accuracy data={data} />
            </Panel>
            <Panel id="ins-calibration" title="Calibration" csv={insightsCsvHref('calibration', filter)}>
              <Calibration data={data} />
            </Panel>
          </>
        )}
        <Panel id="ins-pairs" title="Most frequent symptom → cause pairs" csv={insightsCsvHref('pairs', filter)}>
          <Pairs data={data} labels={labels} />
        </Panel>
        <Panel id="ins-labour" title="Mean minutes to fix, per cause" csv={insightsCsvHref('labour', filter)}>
          <Labour data={data} labels={labels} />
        </Panel>
        <Panel id="ins-wrong-way" title="Rules that pointed the wrong way" csv={insightsCsvHref('wrong-way' satisfies InsightTable, filter)}>
          <WrongWay data={data} labels={labels} />
        </Panel>
      </div>
    );
  }

  return (
    <Page
      title={
        <>
          <ChartIcon size={26} className="fw-ins-title-icon" /> Insights
        </>
      }
      lead="How good the ranking was at case open, measured against the causes shops and racers confirmed."
      actions={
        <>
          <AnchorButton className="fw-touch" size="large" variant="outlined" icon={<DownloadIcon />} href={outcomesCsvHref(filter)} download text="Outcomes CSV" />
          <LinkButton className="fw-touch" size="large" intent="primary" to={paths.rulesets} text="Propose new weights" />
        </>
      }
    >
      <PeriodFilter
        value={filter}
        onChange={setFilter}
        versions={versions.data?.versions ?? []}
        allVersionsLabel={active ? `Active version (${active})` : 'Active version'}
        idPrefix="insights"
      />
      {body}
    </Page>
  );
}
