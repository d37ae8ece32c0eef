import type { ReactNode } from 'react';
import { Card, H2 } from '@blueprintjs/core';

/** One review panel on the case page: a card with a heading that names it as a region. */
export function ReviewPanel({ id, title, icon, children, className }: { id: string; title: ReactNode; icon?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <Card className={className ? `fw-review-panel ${className}` : 'fw-review-panel'} role="region" aria-labelledby={id}>
      <H2 id={id} className="fw-review-title">
        {icon}
        <span>{title}</span>
      </H2>
      {children}
    </Card>
  );
}
