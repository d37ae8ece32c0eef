import { useMemo } from 'react';
import { Colors } from '@blueprintjs/core';
import { CartesianGrid, ComposedChart, Line, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from 'recharts';
import { formatDensity, type JettingSessionDto, type JetSuggestionResponse } from '@fuelwright/shared';
import { useMediaQuery } from '../../../lib/use-media-query';
import {
  DENSITY_TICK_STEPS,
  JET_TICK_STEPS,
  densityDomain,
  jetDomain,
  niceTicks,
  sessionPoints,
  suggestionLine,
  type JetPoint,
} from '../lib/chart-data';

type Mark = 'circle' | 'triangle' | 'diamond' | 'star' | 'dash';

const SERIES = {
  right: { name: 'Ran right', colour: Colors.GREEN3, mark: 'circle' },
  rich: { name: 'Ran rich', colour: Colors.ORANGE3, mark: 'triangle' },
  lean: { name: 'Ran lean', colour: Colors.RED3, mark: 'diamond' },
  today: { name: 'Today (suggested size)', colour: Colors.BLUE3, mark: 'star' },
  line: { name: 'Same mixture as the baseline', colour: Colors.BLUE4, mark: 'dash' },
} as const satisfies Record<string, { name: string; colour: string; mark: Mark }>;

function Swatch({ mark, colour }: { mark: Mark; colour: string }) {
  const shapes: Record<Mark, React.JSX.Element> = {
    circle: <circle cx="8" cy="8" r="5" fill={colour} />,
    triangle: <polygon points="8,2 14,13 2,13" fill={colour} />,
    diamond: <polygon points="8,1 15,8 8,15 1,8" fill={colour} />,
    star: <polygon points="8,1 10,6 15,6 11,9.5 12.5,15 8,11.5 3.5,15 5,9.5 1,6 6,6" fill={colour} />,
    dash: <line x1="0" y1="8" x2="16" y2="8" stroke={colour} strokeWidth="2" strokeDasharray="4 3" />,
  };
  return (
    <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true">
      {shapes[mark]}
    </svg>
  );
}

function TooltipBody({ active, payload }: { active?: boolean; payload?: readonly { payload?: JetPoint; name?: string }[] }) {
  const p = active && payload && payload[0]?.payload;
  if (!p) return null;
  return (
    <div className="fw-chart-tooltip">
      <strong>{payload![0].name}</strong>
      <div>{p.label}</div>
      <div>
        Main jet {Number(p.mainJet.toFixed(2))} at {formatDensity(p.density)}
      </div>
    </div>
  );
}

/**
 * Main jet against air density: every logged session (by how it ran), today's suggested jet, and
 * the line of jets that keep the baseline's mixture.
 */
export function JettingChart({ sessions, suggestion }: { sessions: readonly JettingSessionDto[]; suggestion?: JetSuggestionResponse }) {
  const phone = useMediaQuery('(max-width: 767px)');
  const data = useMemo(() => {
    const groups = sessionPoints(sessions);
    const densities = sessions.map((s) => s.densityKgM3);
    const jets = sessions.map((s) => s.mainJet);
    let today: JetPoint[] = [];
    if (suggestion) {
      densities.push(suggestion.air.densityKgM3);
      jets.push(suggestion.suggestion.main.suggested, suggestion.suggestion.main.unrounded);
      today = [{ density: suggestion.air.densityKgM3, mainJet: suggestion.suggestion.main.suggested, label: 'Today' }];
    }
    const xDomain = densityDomain(densities);
    const line = suggestion ? suggestionLine(suggestion.baseline, suggestion.jetKit.scaling, xDomain) : [];
    const yDomain = jetDomain([...jets, ...line.map((p) => p.mainJet)]);
    return { groups, today, line, xDomain, yDomain };
  }, [sessions, suggestion]);

  const xTicks = niceTicks(data.xDomain, DENSITY_TICK_STEPS, phone ? 4 : 8);
  const yTicks = niceTicks(data.yDomain, JET_TICK_STEPS, phone ? 6 : 8);
  const legend = [
    data.line.length > 0 && SERIES.line,
    data.groups.right.length > 0 && SERIES.right,
    data.groups.rich.length > 0 && SERIES.rich,
    data.groups.lean.length > 0 && SERIES.lean,
    data.today.length > 0 && SERIES.today,
  ].filter((s): s is (typeof SERIES)[keyof typeof SERIES] => Boolean(s));

  return (
    <figure className="fw-jet-chart">
      <ul className="fw-chart-legend" aria-label="Chart key">
        {legend.map((s) => (
          <li key={s.name}>
            <Swatch mark={s.mark} colour={s.colour} />
            {s.name}
          </li>
        ))}
      </ul>
      <div className="fw-jet-chart-plot">
        <ResponsiveContainer width="100%" height={phone ? 280 : 340}>
          <ComposedChart margin={{ top: 8, right: 16, bottom: 24, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="var(--fw-chart-grid)" />
            <XAxis
              type="number"
              dataKey="density"
              domain={data.xDomain}
              ticks={xTicks}
              tickFormatter={(v: number) => v.toFixed(phone ? 2 : 3)}
              label={{ value: 'Air density (kg/m³)', position: 'insideBottom', offset: -16 }}
              allowDuplicatedCategory={false}
            />
            <YAxis
              type="number"
              dataKey="mainJet"
              domain={data.yDomain}
              ticks={yTicks}
              width={52}
              tickFormatter={(v: number) => String(Number(v.toFixed(1)))}
            />
            <Tooltip content={<TooltipBody />} cursor={{ strokeDasharray: '3 3' }} />
            {data.line.length > 0 && (
              <Line
                data={data.line}
                dataKey="mainJet"
                name={SERIES.line.name}
                stroke={SERIES.line.colour}
                strokeWidth={2}
                strokeDasharray="6 4"
                dot={false}
                activeDot={false}
                isAnimationActive={false}
              />
            )}
            {(['right', 'rich', 'lean'] as const).map((ran) => (
              <Scatter
                key={ran}
                data={data.groups[ran]}
                dataKey="mainJet"
                name={SERIES[ran].name}
                fill={SERIES[ran].colour}
                shape={SERIES[ran].mark as 'circle' | 'triangle' | 'diamond'}
                isAnimationActive={false}
              />
            ))}
            {data.today.length > 0 && (
              <Scatter data={data.today} dataKey="mainJet" name={SERIES.today.name} fill={SERIES.today.colour} shape="star" isAnimationActive={false} />
            )}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="fw-muted fw-small">
        Main jet (up) against air density (across). Each point is a logged session.
        {suggestion
          ? ' The star is today’s suggested size; the dashed line is the jet that keeps the baseline session’s mixture at each density (the line counts moist-air density only; the suggestion also counts humidity).'
          : ' Enter today’s air above to see today’s point and the suggestion line.'}
      </figcaption>
    </figure>
  );
}
