import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, SegmentedControl } from '@blueprintjs/core';
import { PlusIcon } from '@blueprintjs/icons';
import {
  CARBURETTOR_KIND_LABELS,
  DISPLACEMENT_RANGE_CC,
  DRIVE_LABELS,
  KART_NAME_MAX_LENGTH,
  type CarburettorKind,
  type Drive,
  type KartDto,
} from '@fuelwright/shared';
import { TextField } from '../../../components/text-field';
import { formErrors } from '../../../lib/form-errors';
import { useCreateKart } from '../api/create-kart';

const FIELDS = ['name', 'displacementCc', 'drive', 'carburettorKind'] as const;

/**
 * A minimal kart form inside the walk-through (name, displacement, drive, carburettor): the full
 * kart page has the rest. Calls `onCreated` with the new kart.
 */
export function KartFormInline({
  defaultCarburettorKind,
  onCreated,
  onCancel,
  submitText = 'Add this kart',
  busy = false,
}: {
  defaultCarburettorKind?: CarburettorKind | null;
  submitText?: string;
  /** Work that follows the kart's creation (e.g. saving the case) is still running. */
  busy?: boolean;
  onCreated: (kart: KartDto) => void;
  onCancel?: () => void;
}) {
  const [name, setName] = useState('');
  const [displacement, setDisplacement] = useState('');
  const [drive, setDrive] = useState<Drive>('direct-drive');
  const [kind, setKind] = useState<CarburettorKind>(defaultCarburettorKind ?? 'pump-around');
  const [local, setLocal] = useState<Record<string, string>>({});
  const create = useCreateKart();
  const server = formErrors(create.error, FIELDS);
  const errorsFor = (field: (typeof FIELDS)[number]) => (local[field] ? [local[field]] : server.field(field));

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const cc = Number(displacement.trim());
    const found: Record<string, string> = {};
    if (name.trim() === '') found.name = 'Give the kart a name you will recognise, e.g. its number.';
    if (!Number.isInteger(cc) || cc < DISPLACEMENT_RANGE_CC.min || cc > DISPLACEMENT_RANGE_CC.max) {
      found.displacementCc = `Engine size in cc, a whole number from ${DISPLACEMENT_RANGE_CC.min} to ${DISPLACEMENT_RANGE_CC.max}.`;
    }
    setLocal(found);
    if (Object.keys(found).length > 0) return;
    create.mutate(
      { name: name.trim(), displacementCc: cc, drive, carburettorKind: kind },
      { onSuccess: (kart) => onCreated(kart) },
    );
  };

  return (
    <form className="fw-diag-kart-form" onSubmit={submit} noValidate aria-label="Add a kart">
      <TextField
        id="kart-name"
        label="Kart name"
        maxLength={KART_NAME_MAX_LENGTH}
        value={name}
        onChange={setName}
        errors={errorsFor('name')}
        hint="Its number or a name you will recognise."
      />
      <TextField
        id="kart-displacement"
        label="Engine size (cc)"
        inputMode="numeric"
        placeholder="e.g. 125"
        value={displacement}
        onChange={setDisplacement}
        errors={errorsFor('displacementCc')}
        hint="Two-stroke engine displacement, as on the engine or its papers."
      />
      <FormGroup label="Drive" labelFor="kart-drive" helperText={errorsFor('drive')[0]}>
        <div id="kart-drive">
          <SegmentedControl
            aria-label="Drive"
            size="large"
            fill
            options={(Object.keys(DRIVE_LABELS) as Drive[]).map((value) => ({ value, label: DRIVE_LABELS[value] }))}
            value={drive}
            onValueChange={(value) => setDrive(value as Drive)}
          />
        </div>
      </FormGroup>
      <FormGroup label="Carburettor" labelFor="kart-carburettor" helperText={errorsFor('carburettorKind')[0]}>
        <div id="kart-carburettor">
          <SegmentedControl
            aria-label="Carburettor"
            size="large"
            fill
            className="fw-diag-segmented-wrap"
            options={(Object.keys(CARBURETTOR_KIND_LABELS) as CarburettorKind[]).map((value) => ({
              value,
              label: value === 'pump-around' ? 'Pump-around' : 'Float-valve',
            }))}
            value={kind}
            onValueChange={(value) => setKind(value as CarburettorKind)}
          />
        </div>
      </FormGroup>
      {server.form && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {server.form}
        </Callout>
      )}
      <div className="fw-diag-actions">
        <Button className="fw-touch" type="submit" intent="primary" size="large" icon={<PlusIcon />} text={submitText} loading={create.isPending || busy} />
        {onCancel && <Button className="fw-touch" size="large" variant="minimal" text="Cancel" onClick={onCancel} />}
      </div>
    </form>
  );
}
