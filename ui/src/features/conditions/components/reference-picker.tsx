import { Callout, FormGroup, HTMLSelect, SegmentedControl } from '@blueprintjs/core';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { TextField } from '../../../components/text-field';
import type { ReferenceSessionsState } from '../api/get-reference-sessions';
import { sessionDetailText, sessionOptionText, type ReferenceChoice, type ReferenceKind, type ReferenceSession } from '../lib/air-reference';

/**
 * What the relative air density is measured against. Visitors pick ISA sea level or type a
 * density; a signed-in racer can also pick one of the sessions logged on their karts.
 */
export function ReferencePicker({
  choice,
  onChange,
  signedIn,
  sessions,
  selected,
  errors,
}: {
  choice: ReferenceChoice;
  onChange: (choice: ReferenceChoice) => void;
  signedIn: boolean;
  sessions: ReferenceSessionsState;
  /** The session in use when `choice` is a session (the remembered one, or the first listed). */
  selected: ReferenceSession | null;
  errors: (field: string) => readonly string[] | undefined;
}) {
  const options: { value: ReferenceKind; label: string }[] = [
    { value: 'isa-sea-level', label: 'ISA sea level' },
    ...(signedIn ? [{ value: 'session' as const, label: 'Logged session' }] : []),
    { value: 'typed', label: 'Typed density' },
  ];
  const setKind = (kind: ReferenceKind) => {
    if (kind === choice.kind) return;
    if (kind === 'session') onChange({ kind, sessionId: selected?.id ?? null });
    else if (kind === 'typed') onChange({ kind, densityText: '' });
    else onChange({ kind });
  };
  const sessionErrors = errors('reference.session') ?? [];
  return (
    <>
      <FormGroup label="Relative air density against">
        <SegmentedControl aria-label="Relative air density against" size="large" fill options={options} value={choice.kind} onValueChange={(v) => setKind(v as ReferenceKind)} />
      </FormGroup>
      {choice.kind === 'session' && <SessionSelect sessions={sessions} selected={selected} onPick={(id) => onChange({ kind: 'session', sessionId: id })} errors={sessionErrors} />}
      {choice.kind === 'typed' && (
        <TextField
          id="conditions-reference-density"
          label="Reference air density (kg/m³)"
          inputMode="decimal"
          autoComplete="off"
          value={choice.densityText}
          onChange={(densityText) => onChange({ kind: 'typed', densityText })}
          errors={errors('reference.densityKgM3')}
          hint="For example a day you noted down, 1.190."
        />
      )}
    </>
  );
}

function SessionSelect({
  sessions,
  selected,
  onPick,
  errors,
}: {
  sessions: ReferenceSessionsState;
  selected: ReferenceSession | null;
  onPick: (sessionId: string) => void;
  errors: readonly string[];
}) {
  if (sessions.status === 'error') {
    return (
      <Callout intent="warning" className="fw-form-note" role="alert">
        Your logged sessions could not be loaded: {sessions.message}
      </Callout>
    );
  }
  if (sessions.status === 'ready' && sessions.sessions.length === 0) {
    return (
      <Callout className="fw-form-note fw-reference-empty" title="No session logged yet">
        <p>Log a session in a kart’s jetting log, and its air becomes a reference you can pick here.</p>
        <LinkButton to={paths.jetting} text="Go to jetting" />
        {errors.map((m) => (
          <p key={m} className="fw-field-error">
            {m}
          </p>
        ))}
      </Callout>
    );
  }
  const list = sessions.status === 'ready' ? sessions.sessions : [];
  const right = list.filter((s) => s.ran === 'right');
  const other = list.filter((s) => s.ran !== 'right');
  const invalid = errors.length > 0;
  return (
    <FormGroup
      label="Logged session"
      labelFor="conditions-reference-session"
      intent={invalid ? 'danger' : 'none'}
      helperText={
        <span id="conditions-reference-session-help" className="fw-field-help">
          {invalid
            ? errors.map((m) => (
                <span key={m} className="fw-field-error">
                  {m}
                </span>
              ))
            : (
                <>
                  {selected && (
                    <span className="fw-reference-detail" data-testid="reference-session-detail">
                      {sessionDetailText(selected)}
                    </span>
                  )}
                  Sessions that ran right come first, newest first; the density is the one worked out when the session was logged.
                </>
              )}
        </span>
      }
    >
      <HTMLSelect
        id="conditions-reference-session"
        className="fw-reference-session"
        large
        fill
        disabled={sessions.status !== 'ready'}
        value={selected?.id ?? ''}
        onChange={(e) => onPick(e.currentTarget.value)}
        aria-describedby="conditions-reference-session-help"
      >
        {sessions.status !== 'ready' && <option value="">Loading your sessions…</option>}
        {right.length > 0 && (
          <optgroup label="Ran right">
            {right.map((s) => (
              <option key={s.id} value={s.id}>
                {sessionOptionText(s)}
              </option>
            ))}
          </optgroup>
        )}
        {other.length > 0 && (
          <optgroup label="Ran rich or lean">
            {other.map((s) => (
              <option key={s.id} value={s.id}>
                {sessionOptionText(s)}
              </option>
            ))}
          </optgroup>
        )}
      </HTMLSelect>
    </FormGroup>
  );
}
