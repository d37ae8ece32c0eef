import { useState, type FormEvent } from 'react';
import { Button, Callout } from '@blueprintjs/core';
import { generatePath, useNavigate } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { TextField } from '../../../components/text-field';
import { isApiError } from '../../../lib/api-client';
import { formErrors } from '../../../lib/form-errors';
import { useStartProposal } from '../api/start-proposal';
import { VERSION_PATTERN } from '../lib/versions';

const FIELDS = ['strength', 'version', 'holdOutFraction', 'seed'];

/**
 * "Propose new weights": the strength of the expert values, the version the proposal would be
 * published as, and the share of outcomes held out for the back-test. Starts the fit and opens
 * the proposal, which shows its progress.
 */
export function ProposeForm({ suggestedVersion, published }: { suggestedVersion: string; published: readonly string[] }) {
  const [strength, setStrength] = useState('200');
  const [version, setVersion] = useState(suggestedVersion);
  const [holdOut, setHoldOut] = useState('20');
  const [local, setLocal] = useState<Record<string, string>>({});
  const start = useStartProposal();
  const navigate = useNavigate();
  const server = formErrors(start.error, FIELDS);
  const errorsFor = (field: string) => (local[field] ? [local[field]] : server.field(field));

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const errors: Record<string, string> = {};
    const s = Number(strength);
    if (!strength.trim() || !Number.isFinite(s) || s < 1 || s > 100_000) errors.strength = 'A number of outcomes from 1 to 100,000.';
    const v = version.trim();
    if (!VERSION_PATTERN.test(v)) errors.version = 'Three numbers with dots, like 1.1.0.';
    else if (published.includes(v)) errors.version = `Version ${v} is already published: pick a new one.`;
    const h = Number(holdOut);
    if (!holdOut.trim() || !Number.isFinite(h) || h < 5 || h > 50) errors.holdOutFraction = 'A percent from 5 to 50.';
    setLocal(errors);
    if (Object.keys(errors).length > 0) return;
    start.mutate(
      { strength: s, version: v, holdOutFraction: h / 100 },
      { onSuccess: (p) => navigate(generatePath(paths.rulesetProposal, { proposalId: p.id })) },
    );
  };

  return (
    <form className="fw-rs-form" onSubmit={submit} noValidate aria-label="Propose new weights">
      {server.form && (
        <Callout intent={isApiError(start.error) && start.error.status === 409 ? 'warning' : 'danger'} role="alert" className="fw-form-error">
          {server.form}
        </Callout>
      )}
      <div className="fw-rs-form-row">
        <TextField
          id="propose-strength"
          label="Strength of the current weights"
          inputMode="decimal"
          hint="How many outcomes’ worth the current values count for. Higher moves the weights less."
          value={strength}
          onChange={setStrength}
          errors={errorsFor('strength')}
        />
        <TextField
          id="propose-version"
          label="Publish as version"
          hint="A new version number; published versions never change."
          value={version}
          onChange={setVersion}
          errors={errorsFor('version')}
        />
        <TextField
          id="propose-hold-out"
          label="Held out for the back-test (%)"
          inputMode="decimal"
          hint="Outcomes left out of the fit, to test the proposal on."
          value={holdOut}
          onChange={setHoldOut}
          errors={errorsFor('holdOutFraction')}
        />
      </div>
      <div>
        <Button type="submit" className="fw-touch" size="large" intent="primary" loading={start.isPending} text="Propose new weights" />
      </div>
    </form>
  );
}
