import type { ReactNode } from 'react';
import { H1 } from '@blueprintjs/core';

/** The frame of every screen: a heading, an optional line under it, then the content. */
export function Page({
  title,
  lead,
  actions,
  narrow = false,
  children,
}: {
  title: ReactNode;
  lead?: ReactNode;
  actions?: ReactNode;
  narrow?: boolean;
  children?: ReactNode;
}) {
  return (
    <div className={narrow ? 'fw-page fw-page-narrow' : 'fw-page'}>
      <header className="fw-page-header">
        <div>
          <H1 className="fw-page-title">{title}</H1>
          {lead && <p className="fw-page-lead">{lead}</p>}
        </div>
        {actions && <div className="fw-page-actions">{actions}</div>}
      </header>
      {children}
    </div>
  );
}
