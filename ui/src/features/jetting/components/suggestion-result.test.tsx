import { render, screen, within } from '@testing-library/react';
import { Classes } from '@blueprintjs/core';
import { describe, expect, it } from 'vitest';
import {
  computeAir,
  suggestJets,
  type JetKit,
  type JetSuggestionResponse,
  type JettingSessionDto,
  type UnitPreferences,
} from '@fuelwright/shared';
import { SuggestionResult } from './suggestion-result';

// Invented demo values: a kart that ran right on a cool day (10 C, 1013 hPa) asks about a warm one
// (26 C, 1005 hPa). The suggestion comes from the real shared/jetting code, so this test checks what
// the screen makes of it.
const METRIC: UnitPreferences = { temperature: 'C', pressure: 'hPa', length: 'm' };
const KIT: JetKit = { scaling: 'flow', main: { step: 2.5 }, pilot: { sizes: [35, 37.5, 40] } };
const TODAY = computeAir({ temperatureC: 26, stationPressureHpa: 1005, relativeHumidityPct: 40 });
const BASE_AIR = computeAir({ temperatureC: 10, stationPressureHpa: 1013, relativeHumidityPct: 40 });

const BASELINE: JettingSessionDto = {
  id: 's1',
  kartId: 'k1',
  sessionOn: '2026-10-04',
  track: 'Club circuit',
  temperatureC: 10,
  stationPressureHpa: 1013,
  relativeHumidityPct: 40,
  densityKgM3: BASE_AIR.densityKgM3,
  dryAirDensityKgM3: BASE_AIR.dryAirDensityKgM3,
  setupId: null,
  mainJet: 185,
  pilotJet: 37.5,
  needleClipGroove: 3,
  airScrewTurnsOut: 1.5,
  plugColour: 'tan',
  ran: 'right',
  lapTimeMs: null,
  note: '',
  createdAt: '2026-10-04T10:00:00.000Z',
};

/** `warmDayLogged`: a second right day with air close to today's, so today is inside the logged range. */
function response(warmDayLogged: boolean): JetSuggestionResponse {
  const history = warmDayLogged ? [{ densityKgM3: TODAY.densityKgM3 - 0.01 }] : [];
  const suggestion = suggestJets({
    baseline: { mainJet: 185, pilotJet: 37.5, airScrewTurnsOut: 1.5, densityKgM3: BASELINE.densityKgM3 },
    today: { densityKgM3: TODAY.densityKgM3 },
    scaling: KIT.scaling,
    mainJetSizes: KIT.main,
    pilotJetSizes: KIT.pilot,
    history,
  });
  return { air: TODAY, baseline: BASELINE, rightSessions: [BASELINE], jetKit: KIT, suggestion };
}

const cautions = (container: HTMLElement) => [...container.querySelectorAll<HTMLElement>('.fw-caution')];
const leanCaution = (container: HTMLElement) => {
  const found = cautions(container).filter((c) => /seize/.test(c.textContent ?? ''));
  expect(found).toHaveLength(1);
  return found[0];
};

describe('SuggestionResult', () => {
  it('leaning out by two main-jet sizes inside the logged range: the lean-seizure caution, first, styled as a caution', () => {
    const result = response(true);
    // The case under test: more than one main-jet size leaner.
    expect(result.suggestion.main.steps).toBe(-2);
    const { container } = render(<SuggestionResult result={result} units={METRIC} />);
    const lean = leanCaution(container);
    expect(lean).toHaveTextContent(/2 sizes leaner than what ran right/);
    expect(lean).toHaveTextContent(/^Caution/);
    expect(lean).toHaveClass(Classes.INTENT_WARNING);
    expect(lean).not.toHaveClass(Classes.INTENT_DANGER);
    // Cautions come before the jets.
    const mainCard = screen.getByTestId('suggested-main');
    for (const c of cautions(container)) expect(c.compareDocumentPosition(mainCard) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('far outside the logged days the same lean-out is a stop, styled as one', () => {
    const { container } = render(<SuggestionResult result={response(false)} units={METRIC} />);
    const lean = leanCaution(container);
    expect(lean).toHaveTextContent(/^Stop/);
    expect(lean).toHaveTextContent(/Do not run this leaner setting/);
    expect(lean).toHaveClass(Classes.INTENT_DANGER);
    expect(screen.getByText('Confidence: low')).toBeInTheDocument();
  });

  it('shows the unrounded main jet beside the rounded one, and the air screw direction', () => {
    render(<SuggestionResult result={response(true)} units={METRIC} />);
    // Metering law for flow-numbered jets (Heywood, Internal Combustion Engine Fundamentals, ch. 7):
    // 185 x sqrt(1.16481 / 1.24464) = 178.97, and the nearest size held in steps of 2.5 is 180.
    const main = screen.getByTestId('suggested-main');
    expect(main).toHaveTextContent(/^180$/);
    const card = main.closest<HTMLElement>('.fw-jet-card')!;
    expect(card).toHaveTextContent('Unrounded 178.97 · baseline 185');
    expect(card).toHaveTextContent('2 sizes leaner than the baseline');
    // The pilot stays (37.5 x 0.9674 = 36.28 rounds back to 37.5), so the low range is trimmed with
    // the air screw: out a quarter turn leans it.
    expect(screen.getByTestId('suggested-pilot')).toHaveTextContent(/^37\.5$/);
    const screw = screen.getByText('Air screw').closest<HTMLElement>('.fw-jet-card')!;
    expect(within(screw).getByText('¼ turn out')).toBeInTheDocument();
    expect(screw).toHaveTextContent('1.75 turns out from lightly seated');
    expect(screen.getByText(/turn the air screw out a quarter turn to lean it/)).toBeInTheDocument();
  });
});
