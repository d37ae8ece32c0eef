import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, SegmentedControl } from '@blueprintjs/core';
import { SOMETHING_ELSE_ID, type CatalogResponse, type OutcomeDto } from '@fuelwright/shared';
import { CautionCallout } from '../../../components/caution-callout';
import { TextField } from '../../../components/text-field';
import { formErrors } from '../../../lib/form-errors';
import { useLogOutcome } from '../api/log-outcome';
import { draftFromOutcome, draftToRequest, EMPTY_DRAFT, validateDraft, type OutcomeDraft, type OutcomeTarget } from '../lib/outcome-draft';
import { CausePicker } from './cause-picker';

const STILL_FIXED_OPTIONS = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
  { value: 'unknown', label: 'Not known yet' },
];

const FIELDS = ['confirmedCauses', 'otherNote', 'fix', 'parts', 'labourMinutes', 'stillFixed', 'supersedesId', 'caseId', 'workOrderId'] as const;

/**
 * Logs what really fixed a kart: the confirmed cause(s), the fix, parts, labour minutes and the
 * follow-up. With `supersedes` it is a correction: a new entry that names the one it corrects
 * (the old one stays as it was, and stops counting).
 */
export function OutcomeForm({
  target,
  catalog,
  likely,
  initial,
  supersedes,
  onLogged,
  onCancel,
  idPrefix = 'outcome',
}: {
  target: OutcomeTarget;
  catalog: CatalogResponse;
  likely?: readonly string[];
  initial?: Partial<OutcomeDraft>;
  supersedes?: OutcomeDto;
  onLogged: (o: OutcomeDto) => void;
  onCancel?: () => void;
  idPrefix?: string;
}) {
  const [draft, setDraft] = useState<OutcomeDraft>(() => (supersedes ? draftFromOutcome(supersedes) : { ...EMPTY_DRAFT, ...initial }));
  const [local, setLocal] = useState<Record<string, string>>({});
  const log = useLogOutcome();
  const server = formErrors(log.error, FIELDS);
  const errorsFor = (field: string): string[] => (local[field] ? [local[field]] : server.field(field));
  const set = <K extends keyof OutcomeDraft>(key: K, value: OutcomeDraft[K]) => {
    setDraft((d) => ({ ...d, [key]: value }));
    // A message the browser gave goes once the field changes (the next submit checks again).
    const field = key === 'causes' ? 'confirmedCauses' : key;
    setLocal((errors) => (field in errors ? Object.fromEntries(Object.entries(errors).filter(([name]) => name !== field)) : errors));
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const errors = validateDraft(draft);
    setLocal(errors);
    if (Object.keys(errors).length > 0) return;
    log.mutate(draftToRequest(draft, target, supersedes?.id), { onSuccess: onLogged });
  };

  const id = (name: string) => `${idPrefix}-${name}`;
  const correcting = supersedes !== undefined;
  return (
    <form className="fw-oc-form" onSubmit={submit} noValidate aria-label={correcting ? 'Correct this entry' : 'Log what really fixed it'}>
      {correcting && (
        <Callout intent="primary" compact className="fw-oc-note">
          The entry stays as it was and stops counting; this one takes its place in the insights.
        </Callout>
      )}
      {server.form && (
        <Callout intent="danger" role="alert" className="fw-form-error">
          {server.form}
        </Callout>
      )}
      <CausePicker catalog={catalog} value={draft.causes} onChange={(v) => set('causes', v)} likely={likely} error={errorsFor('confirmedCauses')[0]} />
      {draft.causes.includes(SOMETHING_ELSE_ID) && (
        <TextField id={id('other')} label="What was it?" value={draft.otherNote} onChange={(v) => set('otherNote', v)} errors={errorsFor('otherNote')} maxLength={1000} />
      )}
      <TextField
        id={id('fix')}
        label="What fixed it"
        hint="For example: new foam blocks, return tube pushed home, float height reset."
        value={draft.fix}
        onChange={(v) => set('fix', v)}
        errors={errorsFor('fix')}
        maxLength={500}
      />
      <div className="fw-oc-row">
        <TextField id={id('parts')} label="Parts (optional)" value={draft.parts} onChange={(v) => set('parts', v)} errors={errorsFor('parts')} maxLength={500} />
        <TextField
          id={id('minutes')}
          label="Labour minutes (optional)"
          inputMode="numeric"
          value={draft.labourMinutes}
          onChange={(v) => set('labourMinutes', v)}
          errors={errorsFor('labourMinutes')}
        />
      </div>
      <FormGroup label="Still fixed after the next session?" labelFor={id('still')} helperText="Leave it at “Not known yet” and correct the entry once you know.">
        <div id={id('still')}>
          <SegmentedControl
            aria-label="Still fixed after the next session?"
            size="large"
            fill
            options={STILL_FIXED_OPTIONS}
            value={draft.stillFixed}
            onValueChange={(v) => set('stillFixed', v as OutcomeDraft['stillFixed'])}
          />
        </div>
      </FormGroup>
      {draft.stillFixed === 'no' && (
        <CautionCallout kind="stop" title="Stop: the fault came back">
          Do not race the kart until the cause is found: a lean mixture can seize the engine, and a sticking throttle can leave the kart
          at full power. Follow the track’s technical inspection and your local rules, and have a qualified engine builder look at it.
        </CautionCallout>
      )}
      <div className="fw-oc-actions">
        <Button type="submit" className="fw-touch" size="large" intent="primary" loading={log.isPending} text={correcting ? 'Save the correction' : 'Log the outcome'} />
        {onCancel && <Button className="fw-touch" size="large" variant="outlined" text="Cancel" onClick={onCancel} />}
      </div>
    </form>
  );
}
