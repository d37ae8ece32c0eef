import { useState } from 'react';
import { Button, Tag } from '@blueprintjs/core';
import { ChevronDownIcon, ChevronUpIcon, TimeIcon, WarningSignIcon } from '@blueprintjs/icons';
import type { PlanStep } from '@fuelwright/shared';
import { formatMinutes, type CatalogLookup } from './catalog-lookup';

const SHOWN = 6;

/** The checks in the order to do them: minutes each, what has to come apart, cautions, skipped. */
export function CheckPlan({
  plan,
  skipped,
  expectedMinutes,
  lookup,
}: {
  plan: PlanStep[];
  skipped: readonly string[];
  expectedMinutes: number;
  lookup: CatalogLookup;
}) {
  const [all, setAll] = useState(false);
  if (plan.length === 0) {
    return <p className="fw-muted">No checks left in the plan.</p>;
  }
  const steps = all ? plan : plan.slice(0, SHOWN);
  const later = plan.filter((s) => skipped.includes(s.checkId));
  return (
    <div className="fw-diag-plan-wrap">
      <p className="fw-diag-plan-lead">
        <TimeIcon />
        <span>
          The quickest order to find the fault: about <strong>{formatMinutes(expectedMinutes)}</strong> expected.
        </span>
      </p>
      <ol className="fw-diag-plan" aria-label="Check plan, in order">
        {steps.map((step, i) => {
          const group = lookup.group(step.group);
          const hazard = step.cautions.length > 0 || (lookup.check(step.checkId)?.cautions.length ?? 0) > 0;
          return (
            <li key={step.checkId} className={i === 0 ? 'fw-diag-plan-step fw-diag-plan-next' : 'fw-diag-plan-step'} data-check={step.checkId}>
              <span className="fw-diag-plan-number" aria-hidden="true">
                {i + 1}
              </span>
              <div className="fw-diag-plan-body">
                <span className="fw-diag-plan-label">{step.label}</span>
                <span className="fw-diag-plan-meta">
                  <span>{formatMinutes(step.minutes)}</span>
                  <span aria-hidden="true">·</span>
                  <span>{group?.label ?? step.group}</span>
                  {step.openingMinutes > 0 && <span className="fw-muted">(+{formatMinutes(step.openingMinutes)} to open)</span>}
                </span>
                <span className="fw-diag-plan-tags">
                  {hazard && (
                    <Tag minimal intent="warning" icon={<WarningSignIcon />}>
                      Cautions first
                    </Tag>
                  )}
                  {step.safetyFirst && (
                    <Tag minimal intent="danger">
                      First, for safety
                    </Tag>
                  )}
                  {skipped.includes(step.checkId) && <Tag minimal>Skipped for now</Tag>}
                </span>
              </div>
            </li>
          );
        })}
      </ol>
      {later.length > 0 && (
        <p className="fw-muted fw-small fw-diag-skipped-note">
          Skipped for now, moved to the end of the plan: {later.map((s) => s.label).join('; ')}.
        </p>
      )}
      {plan.length > SHOWN && (
        <Button
          className="fw-touch"
          variant="minimal"
          endIcon={all ? <ChevronUpIcon /> : <ChevronDownIcon />}
          text={all ? 'Show the next checks only' : `Show all ${plan.length} checks`}
          onClick={() => setAll(!all)}
        />
      )}
    </div>
  );
}
