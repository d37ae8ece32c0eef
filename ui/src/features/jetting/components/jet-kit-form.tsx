import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, SegmentedControl } from '@blueprintjs/core';
import { FloppyDiskIcon } from '@blueprintjs/icons';
import type { JetKit, JetNumberScaling, JetSizeSet } from '@fuelwright/shared';
import { parseDecimal } from '../../../components/air-reading-fields';
import { TextField } from '../../../components/text-field';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { useSaveJetKit } from '../api/save-jet-kit';

type SetMode = 'step' | 'sizes';
interface SetFields {
  mode: SetMode;
  step: string;
  sizes: string;
}

const FIELDS = ['scaling', 'main', 'main.step', 'main.sizes', 'pilot', 'pilot.step', 'pilot.sizes'] as const;

function toFields(set: JetSizeSet): SetFields {
  return 'sizes' in set ? { mode: 'sizes', step: '2.5', sizes: set.sizes.join(', ') } : { mode: 'step', step: String(set.step), sizes: '' };
}

/** "175, 177.5 180" to numbers; null when any entry is not a number. */
export function parseSizes(text: string): number[] | null {
  const parts = text.split(/[\s;]+|,\s*/).filter((p) => p !== '');
  const nums = parts.map((p) => parseDecimal(p));
  return nums.length > 0 && nums.every((n) => n !== null) ? (nums as number[]) : null;
}

function SizeSetFields({
  idPrefix,
  name,
  value,
  onChange,
  errors,
}: {
  idPrefix: string;
  name: 'main' | 'pilot';
  value: SetFields;
  onChange: (v: SetFields) => void;
  errors: (f: string) => string[];
}) {
  const label = name === 'main' ? 'Main jets' : 'Pilot jets';
  return (
    <fieldset className="fw-kit-set">
      <legend>{label} you hold</legend>
      <SegmentedControl
        aria-label={`${label}: steps or a list`}
        size="large"
        fill
        options={[
          { value: 'step', label: 'Every step' },
          { value: 'sizes', label: 'A list of sizes' },
        ]}
        value={value.mode}
        onValueChange={(m) => onChange({ ...value, mode: m as SetMode })}
      />
      {value.mode === 'step' ? (
        <TextField
          id={`${idPrefix}-${name}-step`}
          label="Step between sizes"
          inputMode="decimal"
          value={value.step}
          onChange={(step) => onChange({ ...value, step })}
          errors={[...errors(name), ...errors(`${name}.step`)]}
          hint={name === 'main' ? 'Often 2.5 or 5.' : 'Often 2.5 (35, 37.5, 40 …).'}
        />
      ) : (
        <TextField
          id={`${idPrefix}-${name}-sizes`}
          label="Sizes"
          inputMode="decimal"
          placeholder={name === 'main' ? '175, 177.5, 180, 182.5, 185' : '35, 37.5, 40'}
          value={value.sizes}
          onChange={(sizes) => onChange({ ...value, sizes })}
          errors={[...errors(name), ...errors(`${name}.sizes`)]}
          hint="Separated by commas or spaces."
        />
      )}
    </fieldset>
  );
}

/** How this kart's jet numbers scale, and which sizes the racer holds (the suggestion rounds to them). */
export function JetKitForm({ kartId, kit, saved, canEdit }: { kartId: string; kit: JetKit; saved: boolean; canEdit: boolean }) {
  const [scaling, setScaling] = useState<JetNumberScaling>(kit.scaling);
  const [main, setMain] = useState<SetFields>(() => toFields(kit.main));
  const [pilot, setPilot] = useState<SetFields>(() => toFields(kit.pilot));
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});
  const save = useSaveJetKit(kartId);
  const notify = useNotify();
  const server = formErrors(save.error, FIELDS);
  const errors = (f: string) => clientErrors[f] ?? server.field(f);

  const toSet = (name: 'main' | 'pilot', v: SetFields, errs: Record<string, string[]>): JetSizeSet | null => {
    if (v.mode === 'step') {
      const step = parseDecimal(v.step);
      if (step === null) errs[`${name}.step`] = ['Enter the step between sizes, e.g. 2.5.'];
      return step === null ? null : { step };
    }
    const sizes = parseSizes(v.sizes);
    if (sizes === null) errs[`${name}.sizes`] = ['List the sizes as numbers, e.g. 35, 37.5, 40.'];
    return sizes === null ? null : { sizes };
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const errs: Record<string, string[]> = {};
    const m = toSet('main', main, errs);
    const p = toSet('pilot', pilot, errs);
    setClientErrors(errs);
    if (!m || !p) return;
    save.mutate({ scaling, main: m, pilot: p }, { onSuccess: () => notify.success('Jet kit saved.') });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Jet kit">
      {!saved && <p className="fw-muted">Not saved yet: the suggestion assumes diameter-numbered jets in steps of 2.5.</p>}
      <FormGroup
        label="Your jet numbers follow"
        intent={errors('scaling').length ? 'danger' : 'none'}
        helperText={
          errors('scaling').join(' ') ||
          'Some makers number jets by hole diameter, others by flow: check with your jets’ maker. Diameter numbering changes the number less for the same change in air.'
        }
      >
        <SegmentedControl
          aria-label="Jet numbers follow"
          size="large"
          fill
          disabled={!canEdit}
          options={[
            { value: 'diameter', label: 'Hole diameter' },
            { value: 'flow', label: 'Flow' },
          ]}
          value={scaling}
          onValueChange={(v) => setScaling(v as JetNumberScaling)}
        />
      </FormGroup>
      <SizeSetFields idPrefix="kit" name="main" value={main} onChange={setMain} errors={errors} />
      <SizeSetFields idPrefix="kit" name="pilot" value={pilot} onChange={setPilot} errors={errors} />
      {server.form && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {server.form}
        </Callout>
      )}
      {canEdit && (
        <Button className="fw-touch" type="submit" intent="primary" size="large" icon={<FloppyDiskIcon />} text="Save jet kit" loading={save.isPending} />
      )}
    </form>
  );
}
