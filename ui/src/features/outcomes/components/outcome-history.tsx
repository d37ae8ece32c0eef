import { useState } from 'react';
import { Button } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';
import type { CatalogResponse, OutcomeDto } from '@fuelwright/shared';
import { correctionChains, type OutcomeTarget } from '../lib/outcome-draft';
import type { Labels } from '../lib/labels';
import { OutcomeEntry } from './outcome-entry';
import { OutcomeForm } from './outcome-form';

/**
 * The outcomes logged on one case or work order: each current entry with the entries it corrected
 * underneath, and "Correct this entry", which opens the form filled with the entry.
 */
export function OutcomeHistory<T extends OutcomeDto>({
  outcomes,
  labels,
  catalog,
  target,
  canCorrect,
  onLogged,
}: {
  outcomes: readonly T[];
  labels: Labels;
  catalog?: CatalogResponse;
  target: OutcomeTarget;
  /** All entries, none, or those the test picks (on a case: the reader's own). */
  canCorrect: boolean | ((o: T) => boolean);
  onLogged?: (o: OutcomeDto) => void;
}) {
  const [correcting, setCorrecting] = useState<string | null>(null);
  const chains = correctionChains(outcomes);
  const correctable = (o: T) => (typeof canCorrect === 'function' ? canCorrect(o) : canCorrect);
  return (
    <ol className="fw-oc-history">
      {chains.map(({ current, corrected }) => (
        <li key={current.id}>
          {correcting === current.id && catalog ? (
            <OutcomeForm
              idPrefix={`correct-${current.id.slice(0, 8)}`}
              target={target}
              catalog={catalog}
              supersedes={current}
              onLogged={(o) => {
                setCorrecting(null);
                onLogged?.(o);
              }}
              onCancel={() => setCorrecting(null)}
            />
          ) : (
            <OutcomeEntry
              o={current}
              labels={labels}
              actions={
                correctable(current) && catalog ? (
                  <Button className="fw-touch" variant="outlined" icon={<EditIcon />} text="Correct this entry" onClick={() => setCorrecting(current.id)} />
                ) : undefined
              }
            />
          )}
          {corrected.length > 0 && (
            <ol className="fw-oc-corrected" aria-label="Entries it corrects">
              {corrected.map((o) => (
                <li key={o.id}>
                  <OutcomeEntry o={o} labels={labels} />
                </li>
              ))}
            </ol>
          )}
        </li>
      ))}
    </ol>
  );
}
