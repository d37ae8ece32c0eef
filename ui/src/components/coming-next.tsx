import type { JSX, ReactNode } from 'react';
import { NonIdealState } from '@blueprintjs/core';
import { BuildIcon } from '@blueprintjs/icons';

/**
 * The honest empty state of a screen that a later update fills: says what will be here,
 * shows no made-up data.
 */
export function ComingNext({ title, children, action }: { title: ReactNode; children: ReactNode; action?: JSX.Element }) {
  return (
    <NonIdealState
      className="fw-coming-next"
      icon={<BuildIcon size={48} />}
      title={title}
      description={
        <>
          <p>{children}</p>
          <p className="fw-muted">Coming next: this screen is not built yet, so there is nothing to show here.</p>
        </>
      }
      action={action}
    />
  );
}
