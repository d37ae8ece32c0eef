import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, H2, HTMLSelect, Radio, RadioGroup, TextArea } from '@blueprintjs/core';
import { FlagIcon } from '@blueprintjs/icons';
import { CASE_NOTE_MAX_LENGTH, SOMETHING_ELSE_ID } from '@fuelwright/shared';
import { TextField } from '../../../components/text-field';
import type { WalkThroughSend, WalkThroughSnapshot } from '../hooks/use-walk-through';
import { formatProbability, type CatalogLookup } from './catalog-lookup';

const TOP = 5;
const OTHER = '__other';

/** What fixed it: one of the likely causes, another cause from the catalog, or something else; and the fix. */
export function ResolveStep({ snapshot, send, lookup }: { snapshot: WalkThroughSnapshot; send: WalkThroughSend; lookup: CatalogLookup }) {
  const ctx = snapshot.context;
  const busy = snapshot.hasTag('busy');
  const ranked = ctx.rank?.causes ?? [];
  const top = ranked.slice(0, TOP);
  const topIds = new Set(top.map((c) => c.id));
  const others = lookup.catalog.causes.filter((c) => !topIds.has(c.id) && !(ctx.rank?.excluded ?? []).some((e) => e.id === c.id));
  const [choice, setChoice] = useState<string>('');
  const [other, setOther] = useState<string>('');
  const [fix, setFix] = useState('');
  const [note, setNote] = useState('');
  const causeId = choice === OTHER ? other : choice;
  const fixes = lookup.cause(causeId)?.fixes ?? [];
  const serverFields = ctx.error?.status === 400 ? ctx.error.fields : {};
  const errorOf = (key: string) => ctx.formErrors[key] ?? serverFields[key]?.[0];

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    send({ type: 'RESOLVE.SUBMIT', causeId, fix, note });
  };

  return (
    <form className="fw-diag-step" onSubmit={submit} noValidate aria-label="What fixed it">
      <H2 className="fw-diag-h2">What fixed it?</H2>
      <p className="fw-muted">Pick what was wrong and say what you did. This is what the next racer with the same symptoms learns from.</p>
      {ctx.error && ctx.error.status !== 400 && (
        <Callout intent="danger" role="alert">
          {ctx.error.message}
        </Callout>
      )}
      <FormGroup
        label="What was wrong"
        intent={errorOf('causeId') ? 'danger' : 'none'}
        helperText={errorOf('causeId')}
      >
        <RadioGroup className="fw-diag-radio-cards" selectedValue={choice} onChange={(e) => setChoice(e.currentTarget.value)}>
          {[
            ...top.map((cause) => (
              <Radio
                key={cause.id}
                size="large"
                value={cause.id}
                className="fw-diag-radio-card"
                labelElement={
                  <>
                    <strong>{cause.label}</strong>
                    <span className="fw-diag-desc fw-muted fw-small">{formatProbability(cause.probability)} likely before the fix</span>
                  </>
                }
              />
            )),
            <Radio key={OTHER} size="large" value={OTHER} className="fw-diag-radio-card" label="Another cause from the list" />,
            <Radio
              key={SOMETHING_ELSE_ID}
              size="large"
              value={SOMETHING_ELSE_ID}
              className="fw-diag-radio-card"
              label={lookup.catalog.somethingElse.label}
            />,
          ]}
        </RadioGroup>
      </FormGroup>
      {choice === OTHER && (
        <FormGroup label="Which cause" labelFor="resolve-other">
          <HTMLSelect
            id="resolve-other"
            large
            fill
            value={other}
            onChange={(e) => setOther(e.currentTarget.value)}
            options={[{ value: '', label: 'Pick a cause', disabled: true }, ...others.map((c) => ({ value: c.id, label: c.label }))]}
          />
        </FormGroup>
      )}
      <TextField
        id="resolve-fix"
        label="What you did"
        maxLength={500}
        value={fix}
        onChange={setFix}
        errors={errorOf('fix') ? [errorOf('fix')!] : []}
        hint="For example: fitted new foam blocks, cleaned the pilot jet."
      />
      {fixes.length > 0 && (
        <div className="fw-diag-chips" role="group" aria-label="Usual fixes for this cause">
          <span className="fw-muted fw-small fw-diag-chips-label">Usual fix, tap to use:</span>
          {fixes.map((id) => (
            <Button key={id} className="fw-diag-chip" variant="outlined" text={lookup.fixLabel(id)} onClick={() => setFix(lookup.fixLabel(id))} />
          ))}
        </div>
      )}
      <FormGroup label="Note (optional)" labelFor="resolve-note">
        <TextArea id="resolve-note" fill maxLength={CASE_NOTE_MAX_LENGTH} value={note} onChange={(e) => setNote(e.currentTarget.value)} />
      </FormGroup>
      <div className="fw-diag-actions fw-diag-actions-main">
        <Button className="fw-touch fw-diag-primary" type="submit" intent="success" size="large" icon={<FlagIcon />} text="Save: fixed" loading={busy} />
        <Button className="fw-touch" size="large" variant="minimal" text="Not yet: back to the causes" disabled={busy} onClick={() => send({ type: 'RESOLVE.CANCEL' })} />
      </div>
    </form>
  );
}
