import { useEffect, useRef } from 'react';
import { Card, H3, Tag, type Intent } from '@blueprintjs/core';
import {
  formatDensity,
  formatLength,
  formatNumber,
  formatPercent,
  type JetChoice,
  type JetConfidence,
  type JetSuggestionResponse,
  type UnitPreferences,
} from '@fuelwright/shared';
import { CautionCallout } from '../../../components/caution-callout';

const CONFIDENCE_INTENT: Record<JetConfidence, Intent> = { high: 'success', medium: 'warning', low: 'danger' };
const jet = (n: number) => String(Number(n.toFixed(3)));

function JetCard({ name, choice }: { name: string; choice: JetChoice }) {
  const move =
    choice.steps === 0
      ? 'Same size as the baseline'
      : `${Math.abs(choice.steps)} size${Math.abs(choice.steps) === 1 ? '' : 's'} ${choice.steps < 0 ? 'leaner' : 'richer'} than the baseline`;
  return (
    <Card className="fw-jet-card" compact>
      <div className="fw-figure-label">{name}</div>
      <div className="fw-jet-value" data-testid={`suggested-${name.toLowerCase().replace(/ .*/, '')}`}>
        {jet(choice.suggested)}
      </div>
      <div className={choice.change === 'leaner' ? 'fw-jet-move fw-jet-move-lean' : 'fw-jet-move'}>{move}</div>
      <div className="fw-muted fw-small">
        Unrounded {choice.unrounded.toFixed(2)} · baseline {jet(choice.baseline)}
        {choice.beyondKit ? ' · beyond the sizes you hold' : ''}
      </div>
    </Card>
  );
}

/** Today's suggestion: cautions first, then the jets, the confidence, today's air and the reasoning. */
export function SuggestionResult({ result, units }: { result: JetSuggestionResponse; units: UnitPreferences }) {
  const { suggestion, air, baseline } = result;
  const ref = useRef<HTMLElement>(null);
  // On a phone the answer is below the fold: bring its cautions into view.
  useEffect(() => {
    ref.current?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }, [result]);
  const range = suggestion.loggedRange;
  // The power correction factor is not shown here, so neither are its range notes.
  const airWarnings = air.warnings.filter((w) => !w.startsWith('Power correction factor'));
  const rangeText =
    range.position === 'inside'
      ? `Inside your ${range.days} logged day${range.days === 1 ? '' : 's'} that ran right`
      : `${formatPercent(range.outsideByPct)} ${range.position} than any of your ${range.days} logged day${range.days === 1 ? '' : 's'} that ran right`;
  return (
    <section ref={ref} className="fw-suggestion" aria-label="Today’s suggestion">
      {suggestion.cautions.map((c) => (
        <CautionCallout key={c.code} kind={c.severity}>
          {c.text}
        </CautionCallout>
      ))}
      <div className="fw-jet-cards">
        <JetCard name="Main jet" choice={suggestion.main} />
        {suggestion.pilot && <JetCard name="Pilot jet" choice={suggestion.pilot} />}
        {suggestion.airScrew && (
          <Card className="fw-jet-card" compact>
            <div className="fw-figure-label">Air screw</div>
            <div className="fw-jet-value fw-jet-value-small">
              {suggestion.airScrew.direction === 'none'
                ? 'Leave as it was'
                : `${suggestion.airScrew.turns === 0.25 ? '¼' : suggestion.airScrew.turns} turn ${suggestion.airScrew.direction}`}
            </div>
            {suggestion.airScrew.suggestedTurnsOut !== null && (
              <div className="fw-muted fw-small">{suggestion.airScrew.suggestedTurnsOut} turns out from lightly seated</div>
            )}
          </Card>
        )}
      </div>
      <div className="fw-suggestion-facts">
        <Tag size="large" intent={CONFIDENCE_INTENT[suggestion.confidence]} className="fw-confidence">
          Confidence: {suggestion.confidence}
        </Tag>
        <span>{rangeText}.</span>
      </div>
      <p className="fw-suggestion-air">
        Today: {formatDensity(air.densityKgM3)} ({formatPercent(suggestion.densityChangePct)} against the baseline), density
        altitude {formatLength(air.densityAltitudeM, units.length)}. Baseline: {baseline.sessionOn}
        {baseline.track ? ` at ${baseline.track}` : ''}, main {jet(baseline.mainJet)}
        {baseline.pilotJet !== null ? `, pilot ${jet(baseline.pilotJet)}` : ''}, {formatDensity(baseline.densityKgM3)}.
      </p>
      {airWarnings.length > 0 && <p className="fw-muted fw-small">About today’s air: {airWarnings.join(' ')}</p>}
      <H3 className="fw-subsection-title">Why</H3>
      <ol className="fw-reasoning">
        {suggestion.reasoning.map((r) => (
          <li key={r}>{r}</li>
        ))}
      </ol>
      <p className="fw-muted fw-small">
        Jet ratio {formatNumber(suggestion.jetNumberRatio, 4)} ({suggestion.basis === 'dry-air' ? 'humidity counted' : 'humidity not counted'}).
      </p>
    </section>
  );
}
