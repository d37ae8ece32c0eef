import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, HTMLSelect, SegmentedControl, TextArea } from '@blueprintjs/core';
import { FloppyDiskIcon } from '@blueprintjs/icons';
import {
  PLUG_COLOURS,
  PLUG_COLOUR_LABELS,
  SESSION_NOTE_MAX_LENGTH,
  TRACK_NAME_MAX_LENGTH,
  type JettingSessionDto,
  type JettingSessionInput,
  type PlugColour,
  type Ran,
  type SetupDto,
  type UnitPreferences,
} from '@fuelwright/shared';
import {
  AIR_API_FIELDS,
  AirReadingFields,
  parseAirForm,
  parseDecimal,
  useConvertOnUnitChange,
  type AirFormValues,
} from '../../../components/air-reading-fields';
import { TextField } from '../../../components/text-field';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { useLogSession } from '../api/log-session';
import { JET_FIELDS, jetTextsFrom, setupLabel, setupOptionLabel, type JetTexts } from '../lib/setup-summary';

const FIELDS = [
  ...AIR_API_FIELDS,
  'sessionOn',
  'track',
  'setupId',
  'mainJet',
  'pilotJet',
  'needleClipGroove',
  'airScrewTurnsOut',
  'plugColour',
  'ran',
  'lapTimeMs',
  'note',
] as const;

/** Today in the browser's own calendar, YYYY-MM-DD. */
export function localToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** "54.321" or "1:02.345" (minutes:seconds) to milliseconds; null when it is neither. */
export function parseLapTime(text: string): number | null {
  const t = text.trim().replace(',', '.');
  const m = /^(?:(\d+):)?(\d+(?:\.\d*)?)$/.exec(t);
  if (!m) return null;
  const seconds = (m[1] ? Number(m[1]) * 60 : 0) + Number(m[2]);
  return Math.round(seconds * 1000);
}

const RAN_OPTIONS: { value: Ran; label: string }[] = [
  { value: 'rich', label: 'Rich' },
  { value: 'right', label: 'Right' },
  { value: 'lean', label: 'Lean' },
];

interface Fields extends JetTexts {
  sessionOn: string;
  track: string;
  /** '' = no setup linked. */
  setupId: string;
  plugColour: PlugColour | '';
  ran: Ran | '';
  lapTime: string;
  note: string;
}

function initialFields(latest: JettingSessionDto | undefined, setup: SetupDto | undefined): Fields {
  return {
    sessionOn: localToday(),
    track: latest?.track ?? '',
    setupId: setup?.id ?? '',
    ...jetTextsFrom(setup, latest),
    plugColour: '',
    ran: '',
    lapTime: '',
    note: '',
  };
}

/**
 * One session of the jetting log: the day's air, the setup it ran, the jets, how it ran. The setup
 * defaults to the kart's latest; picking one fills the jets the racer has not typed from it.
 */
export function LogSessionForm({
  kartId,
  units,
  latest,
  setups,
  setupsError,
  initialAir,
  onDone,
}: {
  kartId: string;
  units: UnitPreferences;
  latest: JettingSessionDto | undefined;
  /** The kart's setup snapshots, newest first. */
  setups: readonly SetupDto[];
  /** Why the setups could not be loaded (the session can still be logged without one). */
  setupsError?: string;
  initialAir: AirFormValues;
  onDone: () => void;
}) {
  const [air, setAir] = useState<AirFormValues>(initialAir);
  useConvertOnUnitChange(units, setAir);
  const [f, setF] = useState<Fields>(() => initialFields(latest, setups[0]));
  /** Jet fields the racer typed into: a setup picked later does not overwrite them. */
  const [typed, setTyped] = useState<ReadonlySet<keyof JetTexts>>(() => new Set());
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});
  const log = useLogSession(kartId);
  const notify = useNotify();
  const server = formErrors(log.error, FIELDS);
  const errors = (name: string) => clientErrors[name] ?? server.field(name);
  const set = (patch: Partial<Fields>) => setF((cur) => ({ ...cur, ...patch }));
  const setJet = (field: keyof JetTexts, value: string) => {
    setTyped((cur) => new Set(cur).add(field));
    set({ [field]: value });
  };
  const chosenSetup = setups.find((s) => s.id === f.setupId);
  const pickSetup = (setupId: string) => {
    const setup = setups.find((s) => s.id === setupId);
    const filled = jetTextsFrom(setup, latest);
    const patch: Partial<Fields> = { setupId };
    // "None" keeps the jets as they are; a setup fills every jet field not typed into.
    if (setup) for (const field of JET_FIELDS) if (!typed.has(field)) patch[field] = filled[field];
    set(patch);
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const parsed = parseAirForm(air, units);
    const errs: Record<string, string[]> = { ...parsed.errors };
    const optional = (name: string, text: string, what: string): number | undefined => {
      if (text.trim() === '') return undefined;
      const n = parseDecimal(text);
      if (n === null) errs[name] = [`${what} must be a number.`];
      return n ?? undefined;
    };
    const mainJet = parseDecimal(f.mainJet);
    if (mainJet === null) errs.mainJet = [f.mainJet.trim() === '' ? 'Enter the main jet it ran with.' : 'The main jet must be a number.'];
    const pilotJet = optional('pilotJet', f.pilotJet, 'The pilot jet');
    const needleClipGroove = optional('needleClipGroove', f.needleClipGroove, 'The clip groove');
    const airScrewTurnsOut = optional('airScrewTurnsOut', f.airScrewTurnsOut, 'The air screw turns');
    let lapTimeMs: number | undefined;
    if (f.lapTime.trim() !== '') {
      const ms = parseLapTime(f.lapTime);
      if (ms === null) errs.lapTimeMs = ['Write the lap time as seconds (54.321) or minutes:seconds (1:02.345).'];
      else lapTimeMs = ms;
    }
    if (f.ran === '') errs.ran = ['Say how it ran: rich, right or lean.'];
    setClientErrors(errs);
    if (!parsed.reading || Object.keys(errs).length > 0 || mainJet === null || f.ran === '') return;
    const input: JettingSessionInput = {
      ...parsed.reading,
      sessionOn: f.sessionOn,
      ...(f.track.trim() ? { track: f.track.trim() } : {}),
      ...(f.setupId ? { setupId: f.setupId } : {}),
      mainJet,
      ...(pilotJet !== undefined ? { pilotJet } : {}),
      ...(needleClipGroove !== undefined ? { needleClipGroove } : {}),
      ...(airScrewTurnsOut !== undefined ? { airScrewTurnsOut } : {}),
      ...(f.plugColour ? { plugColour: f.plugColour } : {}),
      ran: f.ran,
      ...(lapTimeMs !== undefined ? { lapTimeMs } : {}),
      ...(f.note.trim() ? { note: f.note.trim() } : {}),
    };
    log.mutate(input, {
      onSuccess: (s) => {
        notify.success(`Session of ${s.sessionOn} logged.`);
        onDone();
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Log a session" className="fw-log-form">
      <div className="fw-air-row">
        <TextField id="log-date" label="Day" type="date" value={f.sessionOn} onChange={(v) => set({ sessionOn: v })} errors={errors('sessionOn')} />
        <TextField
          id="log-track"
          label="Track"
          maxLength={TRACK_NAME_MAX_LENGTH}
          value={f.track}
          onChange={(v) => set({ track: v })}
          errors={errors('track')}
        />
      </div>
      <AirReadingFields idPrefix="log" values={air} onChange={setAir} units={units} errors={errors} />
      <FormGroup
        label="Setup used"
        labelFor="log-setup"
        intent={errors('setupId').length ? 'danger' : 'none'}
        helperText={
          <span id="log-setup-help">
            {errors('setupId').join(' ') ||
              setupsError ||
              (setups.length === 0
                ? 'No setup recorded for this kart yet: record one on the kart’s page to link it here.'
                : chosenSetup
                  ? `${chosenSetup === setups[0] ? 'The latest setup, ' : ''}${setupLabel(chosenSetup)}. Its jets fill the fields below; change any the kart ran differently.`
                  : 'No setup linked: enter the jets the kart ran below.')}
          </span>
        }
      >
        <HTMLSelect
          id="log-setup"
          large
          fill
          value={f.setupId}
          aria-describedby="log-setup-help"
          onChange={(e) => pickSetup(e.currentTarget.value)}
        >
          <option value="">None</option>
          {/* Short, so the chosen one reads whole in the closed select on a phone; newest first. */}
          {setups.map((s) => (
            <option key={s.id} value={s.id}>
              {setupOptionLabel(s)}
            </option>
          ))}
        </HTMLSelect>
      </FormGroup>
      <div className="fw-jet-row">
        <TextField id="log-main" label="Main jet" inputMode="decimal" value={f.mainJet} onChange={(v) => setJet('mainJet', v)} errors={errors('mainJet')} />
        <TextField id="log-pilot" label="Pilot jet" inputMode="decimal" value={f.pilotJet} onChange={(v) => setJet('pilotJet', v)} errors={errors('pilotJet')} />
        <TextField
          id="log-clip"
          label="Needle clip groove"
          inputMode="numeric"
          value={f.needleClipGroove}
          onChange={(v) => setJet('needleClipGroove', v)}
          errors={errors('needleClipGroove')}
          hint="From the top, 1 = top"
        />
        <TextField
          id="log-air-screw"
          label="Air screw, turns out"
          inputMode="decimal"
          value={f.airScrewTurnsOut}
          onChange={(v) => setJet('airScrewTurnsOut', v)}
          errors={errors('airScrewTurnsOut')}
        />
      </div>
      <FormGroup
        label="How it ran"
        intent={errors('ran').length ? 'danger' : 'none'}
        helperText={errors('ran').join(' ') || 'Right = clean pull to the top and a good plug colour. Sessions that ran right are the baselines of the suggestion.'}
      >
        <SegmentedControl
          aria-label="How it ran"
          size="large"
          fill
          options={RAN_OPTIONS}
          value={f.ran}
          onValueChange={(v) => set({ ran: v as Ran })}
        />
      </FormGroup>
      <div className="fw-air-row">
        <FormGroup
          label="Plug colour"
          labelFor="log-plug"
          intent={errors('plugColour').length ? 'danger' : 'none'}
          helperText={errors('plugColour').join(' ') || 'The insulator nose after a clean cut at full throttle.'}
        >
          <HTMLSelect id="log-plug" large fill value={f.plugColour} onChange={(e) => set({ plugColour: e.currentTarget.value as PlugColour | '' })}>
            <option value="">Not read</option>
            {PLUG_COLOURS.map((c) => (
              <option key={c} value={c}>
                {PLUG_COLOUR_LABELS[c]}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <TextField
          id="log-lap"
          label="Best lap (optional)"
          inputMode="decimal"
          placeholder="54.321 or 1:02.345"
          value={f.lapTime}
          onChange={(v) => set({ lapTime: v })}
          errors={errors('lapTimeMs')}
        />
      </div>
      <FormGroup label="Note" labelFor="log-note" intent={errors('note').length ? 'danger' : 'none'} helperText={errors('note').join(' ') || undefined}>
        <TextArea id="log-note" fill maxLength={SESSION_NOTE_MAX_LENGTH} value={f.note} onChange={(e) => set({ note: e.currentTarget.value })} />
      </FormGroup>
      {server.form && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {server.form}
        </Callout>
      )}
      <div className="fw-form-actions">
        <Button className="fw-touch" size="large" text="Cancel" onClick={onDone} />
        <Button className="fw-touch" type="submit" intent="primary" size="large" icon={<FloppyDiskIcon />} text="Log session" loading={log.isPending} />
      </div>
    </form>
  );
}
