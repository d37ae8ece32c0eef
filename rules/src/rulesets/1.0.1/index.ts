/** The shipped ruleset 1.0.1 as raw JSON (validated by `loadRuleset`). */
import type { RulesetSource } from '../../model.js';
import catalog from './catalog.json' with { type: 'json' };
import fuelSupply from './rules/fuel-supply.json' with { type: 'json' };
import idleAndThrottle from './rules/idle-and-throttle.json' with { type: 'json' };
import jettingAndAir from './rules/jetting-and-air.json' with { type: 'json' };
import pumpAroundBowl from './rules/pump-around-bowl.json' with { type: 'json' };
import rebuildAndWear from './rules/rebuild-and-wear.json' with { type: 'json' };
import starting from './rules/starting.json' with { type: 'json' };
import stopFindings from './rules/stop-findings.json' with { type: 'json' };
import throttleBands from './rules/throttle-bands.json' with { type: 'json' };
import ventsAndLeaks from './rules/vents-and-leaks.json' with { type: 'json' };

export const source: RulesetSource = {
  catalog,
  ruleFiles: {
    'rules/fuel-supply.json': fuelSupply,
    'rules/idle-and-throttle.json': idleAndThrottle,
    'rules/jetting-and-air.json': jettingAndAir,
    'rules/pump-around-bowl.json': pumpAroundBowl,
    'rules/rebuild-and-wear.json': rebuildAndWear,
    'rules/starting.json': starting,
    'rules/stop-findings.json': stopFindings,
    'rules/throttle-bands.json': throttleBands,
    'rules/vents-and-leaks.json': ventsAndLeaks,
  },
};
