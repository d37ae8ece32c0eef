import { useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, TextArea } from '@blueprintjs/core';
import { DisableIcon } from '@blueprintjs/icons';
import { CASE_NOTE_MAX_LENGTH } from '@fuelwright/shared';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { useAbandonCase } from '../api/abandon-case';

/** Asks why (optional) and abandons an open case; the case and its timeline are kept. */
export function AbandonCaseDialog({ caseId, isOpen, onClose }: { caseId: string; isOpen: boolean; onClose: () => void }) {
  const [reason, setReason] = useState('');
  const abandon = useAbandonCase(caseId);
  const notify = useNotify();
  const errors = formErrors(abandon.error, ['reason']);
  const reasonErrors = errors.field('reason');

  return (
    <Dialog isOpen={isOpen} onClose={abandon.isPending ? undefined : onClose} title="Abandon this case?" icon={<DisableIcon />} className="fw-dialog">
      <form
        noValidate
        aria-label="Abandon this case"
        onSubmit={(event) => {
          event.preventDefault();
          const trimmed = reason.trim();
          abandon.mutate(trimmed ? { reason: trimmed } : {}, {
            onSuccess: () => {
              notify.success('Case abandoned. It stays in your list with its timeline.');
              onClose();
            },
          });
        }}
      >
        <DialogBody>
          <p>
            Abandon it when you stop working on this problem without a fix, for example when it went away by itself. The
            case stays in your list with everything recorded so far; it takes no more checks.
          </p>
          <FormGroup
            label="Why (optional)"
            labelFor="abandon-reason"
            intent={reasonErrors.length > 0 ? 'danger' : 'none'}
            helperText={reasonErrors.length > 0 ? reasonErrors.join(' ') : 'For example: went away after a clean; sold the engine.'}
          >
            <TextArea
              id="abandon-reason"
              fill
              autoResize
              maxLength={CASE_NOTE_MAX_LENGTH}
              value={reason}
              onChange={(event) => setReason(event.currentTarget.value)}
              intent={reasonErrors.length > 0 ? 'danger' : 'none'}
            />
          </FormGroup>
          {errors.form && (
            <Callout intent="danger" role="alert">
              {errors.form}
            </Callout>
          )}
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button className="fw-touch" size="large" text="Keep working" onClick={onClose} disabled={abandon.isPending} />
              <Button className="fw-touch" size="large" type="submit" intent="danger" text="Abandon case" loading={abandon.isPending} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
