import { Colors } from '@blueprintjs/core';
import { CartesianGrid, ComposedChart, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { useMediaQuery } from '../../../lib/use-media-query';
import { formatCount, formatPercent, type ReliabilityPoint } from '../lib/format';

const TICKS = [0, 0.2, 0.4, 0.6, 0.8, 1];
const OBSERVED = Colors.ORANGE3;
const DIAGONAL = Colors.GRAY3;

function TooltipBody({ active, payload }: { active?: boolean; payload?: readonly { payload?: ReliabilityPoint }[] }) {
  const p = active && payload?.[0]?.payload;
  if (!p) return null;
  return (
    <div className="fw-ins-tooltip">
      <strong>
        Predicted {formatPercent(p.from)} to {formatPercent(p.to)}
      </strong>
      <div>Mean predicted: {formatPercent(p.predicted, 1)}</div>
      <div>Observed: {formatPercent(p.observed, 1)}</div>
      <div>{formatCount(p.count)} predictions</div>
    </div>
  );
}

/**
 * Reliability diagram: per bin of predicted probability, the mean prediction (across) against how
 * often the cause was really the one (up). On the dashed diagonal the ranking is calibrated; below
 * it, it was too sure; above it, not sure enough.
 */
export function ReliabilityChart({ points, topOnly = false }: { points: readonly ReliabilityPoint[]; topOnly?: boolean }) {
  const phone = useMediaQuery('(max-width: 767px)');
  return (
    <figure className="fw-ins-chart" aria-label="Reliability chart: predicted probability against observed frequency">
      <ul className="fw-ins-legend" aria-label="Chart key">
        <li>
          <svg width="18" height="12" viewBox="0 0 18 12" aria-hidden="true">
            <line x1="0" y1="6" x2="18" y2="6" stroke={OBSERVED} strokeWidth="2" />
            <circle cx="9" cy="6" r="4" fill={OBSERVED} />
          </svg>
          Observed, per bin
        </li>
        <li>
          <svg width="18" height="12" viewBox="0 0 18 12" aria-hidden="true">
            <line x1="0" y1="6" x2="18" y2="6" stroke={DIAGONAL} strokeWidth="2" strokeDasharray="4 3" />
          </svg>
          Perfectly calibrated
        </li>
      </ul>
      <div className="fw-ins-chart-plot">
        <ResponsiveContainer width="100%" height={phone ? 300 : 360}>
          <ComposedChart data={[...points]} margin={{ top: 8, right: 16, bottom: 28, left: phone ? 0 : 20 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="var(--fw-ins-grid)" />
            <XAxis
              type="number"
              dataKey="predicted"
              domain={[0, 1]}
              ticks={TICKS}
              tickFormatter={(v: number) => `${Math.round(v * 100)}%`}
              label={{ value: 'Predicted probability', position: 'insideBottom', offset: -18 }}
            />
            <YAxis
              type="number"
              dataKey="observed"
              domain={[0, 1]}
              ticks={TICKS}
              width={phone ? 44 : 52}
              tickFormatter={(v: number) => `${Math.round(v * 100)}%`}
              label={phone ? undefined : { value: 'Observed frequency', angle: -90, position: 'insideLeft', offset: 4, style: { textAnchor: 'middle' } }}
            />
            <ReferenceLine
              segment={[
                { x: 0, y: 0 },
                { x: 1, y: 1 },
              ]}
              stroke={DIAGONAL}
              strokeWidth={2}
              strokeDasharray="6 4"
              ifOverflow="extendDomain"
            />
            <Tooltip content={<TooltipBody />} cursor={{ strokeDasharray: '3 3' }} />
            <Line type="linear" dataKey="observed" name="Observed" stroke={OBSERVED} strokeWidth={2} dot={{ r: 5, fill: OBSERVED }} isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="fw-muted fw-small">
        {topOnly
          ? 'The ranking’s top cause at case open, grouped by the probability it gave (across), against how often it was the confirmed cause (up).'
          : 'Every cause the ranking listed at case open, grouped by the probability it gave (across), against how often it was the confirmed cause (up).'} Points below the dashed line: the ranking was too sure; above it: not sure enough.
        {phone && ' Up: observed frequency.'}
      </figcaption>
    </figure>
  );
}
