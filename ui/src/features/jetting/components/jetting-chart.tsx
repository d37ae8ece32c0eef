import { useMemo } from 'react';
import { Colors } from '@blueprintjs/core';
import { CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from 'recharts';
import { formatDensity, type JettingSessionDto, type JetSuggestionResponse } from '@fuelwright/shared';
import { useMediaQuery } from '../../../lib/use-media-query';
import { densityDomain, jetDomain, sessionPoints, suggestionLine, type JetPoint } from '../lib/chart-data';

const COLOURS = {
  right: Colors.GREEN3,
  rich: Colors.ORANGE3,
  lean: Colors.RED3,
  today: Colors.BLUE3,
  line: Colors.BLUE4,
};

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
      today = [{ density: suggestion.air.densityKgM3, mainJet: suggestion.suggestion.main.suggested, label: 'Today: suggested size' }];
    }
    const xDomain = densityDomain(densities);
    const line = suggestion ? suggestionLine(suggestion.baseline, suggestion.jetKit.scaling, xDomain) : [];
    const yDomain = jetDomain([...jets, ...line.map((p) => p.mainJet)]);
    return { groups, today, line, xDomain, yDomain };
  }, [sessions, suggestion]);

  return (
    <figure className="fw-jet-chart">
      <div className="fw-jet-chart-plot">
        <ResponsiveContainer width="100%" height={phone ? 300 : 360}>
          <ComposedChart margin={{ top: 8, right: 12, bottom: 24, left: phone ? -8 : 4 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="var(--fw-chart-grid)" />
            <XAxis
              type="number"
              dataKey="density"
              domain={data.xDomain}
              tickCount={phone ? 4 : 6}
              tickFormatter={(v: number) => v.toFixed(3)}
              label={{ value: 'Air density (kg/m³)', position: 'insideBottom', offset: -16 }}
              allowDuplicatedCategory={false}
            />
            <YAxis
              type="number"
              dataKey="mainJet"
              domain={data.yDomain}
              width={phone ? 48 : 56}
              tickFormatter={(v: number) => String(Number(v.toFixed(1)))}
              label={phone ? undefined : { value: 'Main jet', angle: -90, position: 'insideLeft', offset: 12 }}
            />
            <Tooltip content={<TooltipBody />} cursor={{ strokeDasharray: '3 3' }} />
            <Legend verticalAlign="top" height={phone ? 48 : 32} iconSize={phone ? 12 : 14} />
            {data.line.length > 0 && (
              <Line
                data={data.line}
                dataKey="mainJet"
                name="Same mixture as baseline"
                stroke={COLOURS.line}
                strokeWidth={2}
                strokeDasharray="6 4"
                dot={false}
                activeDot={false}
                isAnimationActive={false}
                legendType="plainline"
              />
            )}
            <Scatter data={data.groups.right} dataKey="mainJet" name="Ran right" fill={COLOURS.right} shape="circle" isAnimationActive={false} />
            <Scatter data={data.groups.rich} dataKey="mainJet" name="Ran rich" fill={COLOURS.rich} shape="triangle" isAnimationActive={false} />
            <Scatter data={data.groups.lean} dataKey="mainJet" name="Ran lean" fill={COLOURS.lean} shape="diamond" isAnimationActive={false} />
            {data.today.length > 0 && (
              <Scatter data={data.today} dataKey="mainJet" name="Today (suggested)" fill={COLOURS.today} shape="star" isAnimationActive={false} />
            )}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="fw-muted fw-small">
        Each point is a logged session: the main jet it ran and the air density that day.
        {suggestion
          ? ' The star is today’s suggested size; the dashed line shows the jet that keeps the baseline session’s mixture at each density (humidity not counted on the line).'
          : ' Enter today’s air above to see today’s point and the suggestion line.'}
      </figcaption>
    </figure>
  );
}
