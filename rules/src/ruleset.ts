/**
 * The shipped ruleset. `loadRuleset()` validates it once and returns the same frozen object on
 * every call; a bad shipped file throws `RulesetValidationError` naming file, rule and field,
 * which stops the service at start-up.
 */
import type { Ruleset, RulesetSource } from './model.js';
import { source as v1_0_0 } from './rulesets/1.0.0/index.js';
import { source as v1_0_1 } from './rulesets/1.0.1/index.js';
import { validateRuleset } from './validate.js';

/** The version `loadRuleset()` returns. */
export const SHIPPED_RULESET_VERSION = '1.0.1';

/**
 * Raw JSON of each ruleset version shipped in this package. A shipped version is stored in the
 * `rulesets` table on first start and is then immutable (cases keep the version they were opened
 * with), so a shipped folder is never edited once released: a change goes into a new folder.
 */
export const SHIPPED_RULESET_SOURCES: Readonly<Record<string, RulesetSource>> = { '1.0.0': v1_0_0, '1.0.1': v1_0_1 };

const cache = new Map<string, Ruleset>();

/** The validated shipped ruleset (the current version unless another shipped version is named). */
export function loadRuleset(version: string = SHIPPED_RULESET_VERSION): Ruleset {
  const hit = cache.get(version);
  if (hit) return hit;
  const src = SHIPPED_RULESET_SOURCES[version];
  if (!src) throw new Error(`No shipped ruleset "${version}" (shipped: ${Object.keys(SHIPPED_RULESET_SOURCES).join(', ')})`);
  const ruleset = validateRuleset(src);
  if (ruleset.version !== version) throw new Error(`Ruleset folder ${version} holds catalog version ${ruleset.version}`);
  cache.set(version, ruleset);
  return ruleset;
}
