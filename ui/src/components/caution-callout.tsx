import type { ReactNode } from 'react';
import { Callout } from '@blueprintjs/core';
import { HandIcon, WarningSignIcon } from '@blueprintjs/icons';

/**
 * A caution shown before any step that can hurt someone. `stop` is for findings that end the
 * work: do not drive, see a qualified engine builder.
 */
export function CautionCallout({ kind = 'caution', title, children }: { kind?: 'caution' | 'stop'; title?: string; children: ReactNode }) {
  const stop = kind === 'stop';
  return (
    <Callout
      className="fw-caution"
      intent={stop ? 'danger' : 'warning'}
      icon={stop ? <HandIcon size={20} /> : <WarningSignIcon size={20} />}
      title={title ?? (stop ? 'Stop' : 'Caution')}
    >
      {children}
    </Callout>
  );
}
