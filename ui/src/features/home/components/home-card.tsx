import type { ReactNode } from 'react';
import { Card, H2, Tag } from '@blueprintjs/core';
import type { SVGIconProps } from '@blueprintjs/icons';
import type { ComponentType } from 'react';
import { LinkButton } from '../../../components/link-button';

/**
 * One tile of a home page: what it is for, whether it is ready, and one large action.
 * `comingNext` tiles say so plainly instead of showing made-up data.
 */
export function HomeCard({
  icon: Icon,
  title,
  children,
  to,
  action,
  comingNext = false,
  primary = false,
}: {
  icon: ComponentType<SVGIconProps>;
  title: string;
  children: ReactNode;
  to: string;
  action: string;
  comingNext?: boolean;
  primary?: boolean;
}) {
  return (
    <Card className="fw-home-card" compact={false}>
      <div className="fw-home-card-head">
        <Icon size={24} className="fw-home-card-icon" />
        <H2 className="fw-home-card-title">{title}</H2>
        {comingNext && (
          <Tag minimal round intent="warning">
            Coming next
          </Tag>
        )}
      </div>
      <div className="fw-home-card-body">{children}</div>
      <LinkButton
        className="fw-touch fw-home-card-action"
        size="large"
        intent={primary ? 'primary' : 'none'}
        variant={primary ? 'solid' : 'outlined'}
        fill
        to={to}
        text={action}
      />
    </Card>
  );
}

export function HomeGrid({ children }: { children: ReactNode }) {
  return <div className="fw-home-grid">{children}</div>;
}
