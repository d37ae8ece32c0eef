import type { CatalogResponse, CautionDto, CheckDto, CheckGroupDto, SymptomReport } from '@fuelwright/shared';
import { SOMETHING_ELSE_ID } from '@fuelwright/shared';

/** Finds labels and details in the catalog by id (a missing id reads as the id itself). */
export function catalogLookup(catalog: CatalogResponse) {
  const symptoms = new Map(catalog.symptoms.map((s) => [s.id, s]));
  const causes = new Map(catalog.causes.map((c) => [c.id, c]));
  const checks = new Map(catalog.checks.map((c) => [c.id, c]));
  const groups = new Map(catalog.groups.map((g) => [g.id, g]));
  const fixes = new Map(catalog.fixes.map((f) => [f.id, f]));
  const bands = new Map(catalog.throttleBands.map((b) => [b.id, b.label]));
  const temps = new Map(catalog.engineTemps.map((t) => [t.id, t.label]));
  const positions = new Map(catalog.trackPositions.map((p) => [p.id, p.label]));
  return {
    catalog,
    symptom: (id: string) => symptoms.get(id),
    symptomLabel: (id: string) => symptoms.get(id)?.label ?? id,
    causeLabel: (id: string) => (id === SOMETHING_ELSE_ID ? catalog.somethingElse.label : (causes.get(id)?.label ?? id)),
    cause: (id: string) => causes.get(id),
    check: (id: string): CheckDto | undefined => checks.get(id),
    checkLabel: (id: string) => checks.get(id)?.label ?? id,
    group: (id: string): CheckGroupDto | undefined => groups.get(id as CheckGroupDto['id']),
    groupLabel: (id: string) => groups.get(id as CheckGroupDto['id'])?.label ?? id,
    fixLabel: (id: string) => fixes.get(id)?.label ?? id,
    /** "Bogs when you open the throttle: 1/8 to 1/4 throttle, warm engine, corner exit". */
    symptomText(report: SymptomReport): string {
      const list = <T extends string>(v: T | T[] | undefined) => (v === undefined ? [] : Array.isArray(v) ? v : [v]);
      const details = [
        ...list(report.band).map((b) => bands.get(b) ?? b),
        ...list(report.engine).map((t) => (temps.get(t) ?? t).toLowerCase()),
        ...list(report.where).map((p) => (positions.get(p) ?? p).toLowerCase()),
      ];
      const label = symptoms.get(report.id)?.label ?? report.id;
      return details.length > 0 ? `${label}: ${details.join(', ')}` : label;
    },
    /** The cautions of a check, with those of its disassembly group first when the group is opened. */
    checkCautions(checkId: string, withGroup: boolean): CautionDto[] {
      const check = checks.get(checkId);
      if (!check) return [];
      const group = withGroup ? (groups.get(check.group)?.cautions ?? []) : [];
      const seen = new Set<string>();
      return [...group, ...check.cautions].filter((c) => (seen.has(c.id) ? false : (seen.add(c.id), true)));
    },
  };
}

export type CatalogLookup = ReturnType<typeof catalogLookup>;

/** "35%", "<1%", ">99%". */
export function formatProbability(p: number): string {
  if (!Number.isFinite(p)) return '—';
  const pct = p * 100;
  if (pct > 0 && pct < 1) return '<1%';
  if (pct > 99 && pct < 100) return '>99%';
  return `${Math.round(pct)}%`;
}

/** "2 min", "30 s" for half a minute. */
export function formatMinutes(minutes: number): string {
  if (minutes < 1) return `${Math.round(minutes * 60)} s`;
  return `${Math.round(minutes * 10) / 10} min`;
}
