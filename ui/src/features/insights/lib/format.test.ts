import { describe, expect, it } from 'vitest';
import type { CatalogResponse } from '@fuelwright/shared';
import { insightsCsvHref, labelsFrom, reliabilityPoints, ruleLabel } from './format';

const catalog = {
  symptoms: [{ id: 'bog-on-acceleration', label: 'Bogs when you open the throttle' }],
  causes: [{ id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked' }],
  somethingElse: { label: 'Something else', prior: 0.05 },
} as unknown as CatalogResponse;

describe('insight formatting', () => {
  it('plots only the bins that hold predictions (an empty bin has no mean: null on the wire)', () => {
    const points = reliabilityPoints({
      count: 12,
      expectedCalibrationError: 0.02,
      bins: [
        { from: 0, to: 0.1, count: 10, meanPredicted: 0.02, observed: 0.03 },
        { from: 0.1, to: 0.2, count: 0, meanPredicted: null, observed: null },
        { from: 0.9, to: 1, count: 2, meanPredicted: 0.95, observed: 1 },
      ],
    });
    expect(points).toEqual([
      { predicted: 0.02, observed: 0.03, count: 10, from: 0, to: 0.1 },
      { predicted: 0.95, observed: 1, count: 2, from: 0.9, to: 1 },
    ]);
  });

  it('names rules in words: the symptom label with its detail, or the fact', () => {
    const labels = labelsFrom(catalog);
    expect(ruleLabel('bog-on-acceleration--foam-degraded', labels)).toBe('“Bogs when you open the throttle”');
    expect(ruleLabel('bog-on-acceleration--foam-degraded--corner-exit', labels)).toBe('“Bogs when you open the throttle” (corner exit)');
    expect(ruleLabel('fuel-older-than-a-month', labels)).toBe('Fuel older than a month');
    expect(labels.cause('something-else')).toBe('Something else');
  });

  it('links each table’s CSV with the same period and version', () => {
    expect(insightsCsvHref('pairs', {})).toBe('/api/insights.csv?table=pairs');
    expect(insightsCsvHref('wrong-way', { from: '2026-01-01', version: '1.1.0' })).toBe('/api/insights.csv?table=wrong-way&from=2026-01-01&version=1.1.0');
  });
});
