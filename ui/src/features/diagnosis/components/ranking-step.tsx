import { useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, H2, TextArea } from '@blueprintjs/core';
import { ArrowLeftIcon, CogIcon, DisableIcon, EditIcon, FlagIcon, PlayIcon, TickCircleIcon } from '@blueprintjs/icons';
import { CASE_NOTE_MAX_LENGTH, CHECK_RESULT_LABELS } from '@fuelwright/shared';
import type { WalkThroughSend, WalkThroughSnapshot } from '../hooks/use-walk-through';
import { orderedPlan, previousCheckId } from '../machines/walk-through-model';
import { CauseList } from './cause-list';
import { CautionList } from './caution-list';
import type { CatalogLookup } from './catalog-lookup';
import { CheckPlan } from './check-plan';

function AbandonDialog({ isOpen, busy, onClose, onConfirm }: { isOpen: boolean; busy: boolean; onClose: () => void; onConfirm: (reason: string) => void }) {
  const [reason, setReason] = useState('');
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title="Close this case without a fix?">
      <DialogBody>
        <p>The case and every result stay on record; you cannot add checks to it afterwards.</p>
        <FormGroup label="Why (optional)" labelFor="abandon-reason">
          <TextArea id="abandon-reason" fill maxLength={CASE_NOTE_MAX_LENGTH} value={reason} onChange={(e) => setReason(e.currentTarget.value)} />
        </FormGroup>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button className="fw-touch" size="large" text="Keep it open" onClick={onClose} />
            <Button className="fw-touch" size="large" intent="danger" text="Close the case" loading={busy} onClick={() => onConfirm(reason)} />
          </>
        }
      />
    </Dialog>
  );
}

/** The likely causes and the check plan: after the intake, and again after every check. */
export function RankingStep({ snapshot, send, lookup }: { snapshot: WalkThroughSnapshot; send: WalkThroughSend; lookup: CatalogLookup }) {
  const ctx = snapshot.context;
  const [abandoning, setAbandoning] = useState(false);
  const busy = snapshot.hasTag('busy');
  const rank = ctx.rank;
  if (!rank) return null;
  const plan = orderedPlan(rank, ctx.skipped);
  const next = plan[0];
  const last = ctx.lastRecorded;
  const backTo = previousCheckId(ctx.results, null);
  // Right after a fault was found (or with no check left), saying what fixed it comes first.
  const foundFirst = last?.result === 'fault-found' || !next;
  const resolveButton = (
    <Button
      className="fw-touch fw-diag-primary"
      size="large"
      intent={foundFirst ? 'primary' : 'none'}
      icon={<FlagIcon />}
      text={last?.result === 'fault-found' ? 'Fixed it? Say what fixed it' : 'Found it: say what fixed it'}
      onClick={() => send({ type: 'RESOLVE.START' })}
    />
  );

  return (
    <div className="fw-diag-step fw-diag-wide">
      {ctx.error && (
        <Callout intent="danger" role="alert">
          {ctx.error.message}
        </Callout>
      )}
      {rank.cautions.length > 0 && (
        <section aria-label="Cautions for these symptoms">
          <CautionList cautions={rank.cautions} />
        </section>
      )}
      {last && (
        <Callout className="fw-diag-last" intent={last.result === 'fault-found' ? 'warning' : 'primary'} icon={<TickCircleIcon />} title="Result recorded">
          <strong>{lookup.checkLabel(last.checkId)}</strong>: {CHECK_RESULT_LABELS[last.result]}
          {last.note && <span className="fw-muted"> ({last.note})</span>}. The causes and the plan below are ranked again with it.
        </Callout>
      )}

      {ctx.factsCorrected && !last && (
        <Callout className="fw-diag-last" intent="primary" icon={<CogIcon />} title="Setup and air corrected">
          The causes and the plan below are ranked again with the corrected facts and the checks done so far.
        </Callout>
      )}

      <div className="fw-diag-columns">
        <section className="fw-diag-section-plain" aria-labelledby="causes-title">
          <H2 id="causes-title" className="fw-diag-h2">
            Likely causes
          </H2>
          <p className="fw-muted fw-diag-hint">
            How likely each cause is, from what you told us{ctx.results.length > 0 ? ' and the checks done so far' : ''}. Tap “Why?” for the reasons.
          </p>
          <CauseList rank={rank} previous={ctx.previousCauses} />
        </section>

        <section className="fw-diag-section-plain" aria-labelledby="plan-title">
          <H2 id="plan-title" className="fw-diag-h2">
            Check plan
          </H2>
          <CheckPlan plan={plan} skipped={ctx.skipped} expectedMinutes={rank.expectedMinutes} lookup={lookup} />
        </section>
      </div>

      <div className="fw-diag-actions fw-diag-actions-main">
        {foundFirst && resolveButton}
        {next && (
          <Button
            className="fw-touch fw-diag-primary"
            intent={foundFirst ? 'none' : 'primary'}
            size="large"
            icon={<PlayIcon />}
            text={`${ctx.results.length > 0 ? 'Next check' : 'Start with'}: ${next.label}`}
            onClick={() => send({ type: 'CHECKS.START' })}
          />
        )}
        {!foundFirst && resolveButton}
        {backTo && (
          <Button
            className="fw-touch"
            size="large"
            variant="minimal"
            icon={<ArrowLeftIcon />}
            text={`Back to: ${lookup.checkLabel(backTo)}`}
            onClick={() => send({ type: 'CHECK.BACK' })}
          />
        )}
        <Button className="fw-touch" size="large" variant="minimal" icon={<EditIcon />} text="Change the symptoms" onClick={() => send({ type: 'INTAKE.EDIT' })} />
        {ctx.mode === 'case' && ctx.caseId && ctx.caseState === 'open' && (
          <Button
            className="fw-touch"
            size="large"
            variant="minimal"
            icon={<CogIcon />}
            text="Correct the setup or today's air"
            onClick={() => send({ type: 'FACTS.EDIT' })}
          />
        )}
        {ctx.mode === 'quick' ? (
          <Button className="fw-touch" size="large" variant="minimal" text="Finish without a fix" onClick={() => send({ type: 'FINISH' })} />
        ) : (
          <Button className="fw-touch" size="large" variant="minimal" icon={<DisableIcon />} text="Close without a fix" onClick={() => setAbandoning(true)} />
        )}
      </div>
      {ctx.mode === 'case' && (
        <AbandonDialog
          isOpen={abandoning}
          busy={busy}
          onClose={() => setAbandoning(false)}
          onConfirm={(reason) => {
            setAbandoning(false);
            send({ type: 'ABANDON', reason });
          }}
        />
      )}
    </div>
  );
}
