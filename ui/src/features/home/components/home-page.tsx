import type { Role } from '@fuelwright/shared';
import type { ComponentType } from 'react';
import { Page } from '../../../components/page';
import { useRequiredUser } from '../../../lib/current-user';
import { AdminHome, CoachHome, RacerHome, ShopHome } from './role-homes';

const HOMES: Record<Role, { lead: string; Home: ComponentType }> = {
  racer: { lead: 'Your karts, your open cases, and a quick diagnosis when the engine acts up.', Home: RacerHome },
  coach: { lead: 'Cases your racers share with you.', Home: CoachHome },
  shop: { lead: 'Work orders for customers’ karts and the outcomes you log.', Home: ShopHome },
  admin: { lead: 'Accounts and roles, and the versions of the knowledge base.', Home: AdminHome },
};

/** The signed-in user's home: one page per role. */
export function HomePage() {
  const user = useRequiredUser();
  const { lead, Home } = HOMES[user.role];
  return (
    <Page title={`Hello, ${user.displayName}`} lead={lead}>
      <Home />
    </Page>
  );
}
