import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';
import type { InsightsResponse } from '../api/get-insights';

const bins = (filled: { i: number; count: number; p: number; y: number }[]) =>
  Array.from({ length: 10 }, (_, i) => {
    const f = filled.find((b) => b.i === i);
    return { from: i / 10, to: (i + 1) / 10, count: f?.count ?? 0, meanPredicted: f ? f.p : null, observed: f ? f.y : null };
  });

/** Invented figures in the shape the server sends (NaN arrives as null). */
function figures(version: string, outcomes: number): InsightsResponse {
  return {
    version,
    from: null,
    to: null,
    cases: 7,
    outcomes,
    insights: {
      rulesetVersion: version,
      outcomes,
      skipped: 0,
      withCase: 3,
      walkIns: outcomes - 3,
      ranked: outcomes,
      accuracy: { ranked: outcomes, top1: 4, top3: 9, top1Rate: 4 / outcomes, top3Rate: 9 / outcomes, brier: 0.8123 },
      calibration: { bins: bins([{ i: 0, count: 300, p: 0.02, y: 0.03 }, { i: 3, count: 12, p: 0.33, y: 0.25 }]), count: 312, expectedCalibrationError: 0.0123 },
      topLabelCalibration: { bins: bins([{ i: 3, count: 12, p: 0.33, y: 0.25 }]), count: 12, expectedCalibrationError: 0.08 },
      symptomCausePairs: [{ symptom: 'fuel-from-vents', cause: 'vent-lines-off', outcomes: 5, shareOfSymptom: 0.625 }],
      labourByCause: [{ cause: 'vent-lines-off', outcomes: 5, meanMinutes: 12.4, sdMinutes: null, minMinutes: 10, maxMinutes: 15 }],
      wrongWayRules: {
        rules: [{ rule: 'fuel-from-vents--fuel-level-high', cause: 'fuel-level-high', lr: 2, direction: 'for', fired: 8, wrongWay: 6, wrongWayRate: 0.75 }],
        unknownRuleFirings: 0,
      },
      confirmed: [{ cause: 'vent-lines-off', outcomes: 5 }],
      stillFixed: { yes: 8, no: 1, unknown: 3 },
    },
  };
}

const CATALOG = {
  symptoms: [{ id: 'fuel-from-vents', label: 'Fuel comes out of the vents' }],
  causes: [
    { id: 'vent-lines-off', label: 'Vent lines missing or not routed up' },
    { id: 'fuel-level-high', label: 'Fuel level too high' },
  ],
  somethingElse: { label: 'Something else', prior: 0.05 },
};
const VERSIONS = {
  active: '1.1.0',
  versions: [
    { version: '1.0.0', active: false, publishedAt: '2026-11-01T00:00:00.000Z' },
    { version: '1.1.0', active: true, publishedAt: '2026-11-20T00:00:00.000Z' },
  ],
};

describe('insights page', () => {
  it('shows the counts, accuracy, calibration numbers and tables, with CSV links for the same filter', async () => {
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('shop')),
      'GET /insights': { status: 200, body: figures('1.1.0', 12) },
      'GET /insights?version=1.0.0': { status: 200, body: figures('1.0.0', 40) },
      'GET /rulesets': { status: 200, body: VERSIONS },
      'GET /catalog': { status: 200, body: CATALOG },
    });
    const { router } = renderApp('/insights');
    const counts = await screen.findByRole('region', { name: 'Counts' });
    expect(within(counts).getByText('3 on cases, 9 walk-ins')).toBeInTheDocument();
    expect(within(counts).getByText('1 came back, 3 not known')).toBeInTheDocument();
    const accuracy = screen.getByRole('region', { name: 'How often the ranking was right' });
    expect(within(accuracy).getByText('75 %')).toBeInTheDocument(); // 9 of 12 in the top three
    expect(within(accuracy).getByText('0.812')).toBeInTheDocument();
    expect(within(accuracy).getByText('1.2 %')).toBeInTheDocument();

    // The bins behind the reliability chart, every one, empty ones with a dash.
    const calibration = screen.getByRole('region', { name: 'Calibration' });
    const rows = within(calibration).getAllByRole('row');
    expect(rows).toHaveLength(11);
    expect(rows[4]).toHaveTextContent('30 %–40 %1233.0 %25.0 %');
    expect(rows[2]).toHaveTextContent('10 %–20 %0——');
    await userEvent.setup().click(within(calibration).getByRole('radio', { name: 'Top cause only' }));
    expect(within(calibration).getAllByRole('row')[1]).toHaveTextContent('0 %–10 %0——');

    expect(within(screen.getByRole('region', { name: /symptom → cause pairs/ })).getByText('Vent lines missing or not routed up')).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: /Mean minutes/ })).getByText('12 min')).toBeInTheDocument();
    const wrong = screen.getByRole('region', { name: 'Rules that pointed the wrong way' });
    expect(within(wrong).getByText('“Fuel comes out of the vents”')).toBeInTheDocument();
    expect(within(wrong).getByText('raises Fuel level too high (ratio 2)')).toBeInTheDocument();
    expect(within(wrong).getByRole('button', { name: /Download .* as CSV/ })).toHaveAttribute('href', '/api/insights.csv?table=wrong-way');

    // Another version: the address and the links follow, and the figures are refetched for it.
    await userEvent.setup().selectOptions(screen.getByLabelText('Ruleset version'), '1.0.0');
    await waitFor(() => expect(router.state.location.search).toBe('?version=1.0.0'));
    await waitFor(() => expect(within(screen.getByRole('region', { name: 'Counts' })).getByText('3 on cases, 37 walk-ins')).toBeInTheDocument());
    expect(calls.map((c) => c.path)).toContain('/insights?version=1.0.0');
    expect(screen.getByRole('button', { name: 'Outcomes CSV' })).toHaveAttribute('href', '/api/outcomes.csv?version=1.0.0');
    expect(within(screen.getByRole('region', { name: 'Calibration' })).getByRole('button', { name: /Download/ })).toHaveAttribute(
      'href',
      '/api/insights.csv?table=calibration&version=1.0.0',
    );
  });
});
