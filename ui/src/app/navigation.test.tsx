import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Role } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../test-utils';
import { menuItemsFor } from './navigation';

// What each role may use, and what it may not, from the product design (PRODUCT.md, "Who uses
// it, and for what"). Later features add entries, so the lists name the entries of this shell:
// each must show (in this order) for its role and none of the other roles' entries may.
const SHOWS: Record<Role | 'visitor', string[]> = {
  visitor: ['Quick diagnosis'],
  // A racer account may be a coach's or a shop's that accepted an invitation: shared cases are reachable.
  racer: ['Home', 'Karts', 'Cases', 'Shared cases', 'Quick diagnosis'],
  coach: ['Home', 'Shared cases', 'Quick diagnosis'],
  shop: ['Home', 'Shared cases', 'Work orders', 'Outcomes', 'Quick diagnosis'],
  admin: ['Home', 'Users', 'Outcomes', 'Rulesets', 'Quick diagnosis'],
};
const ROLE_ONLY = ['Home', 'Karts', 'Cases', 'Shared cases', 'Work orders', 'Outcomes', 'Users', 'Rulesets'];

function expectMenu(labels: string[], who: Role | 'visitor') {
  const shows = SHOWS[who];
  expect(labels.filter((label) => shows.includes(label))).toEqual(shows);
  expect(labels.filter((label) => ROLE_ONLY.includes(label) && !shows.includes(label))).toEqual([]);
}

describe('navigation menu', () => {
  it.each(Object.keys(SHOWS) as (Role | 'visitor')[])('lists only what a %s may use', (who) => {
    const user = who === 'visitor' ? null : makeUser(who);
    expectMenu(
      menuItemsFor(user).map((item) => item.label),
      who,
    );
  });

  it('shows the admin menu inline in the desktop navbar, with the name and sign-out', async () => {
    setPhoneWidth(false);
    mockApi({ 'GET /auth/me': meReply(makeUser('admin', { displayName: 'Ada Admin' })) });
    renderApp('/home');
    expect(await screen.findByText('Ada Admin')).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    const links = within(nav).getAllByRole('button').map((link) => link.textContent ?? '');
    expectMenu(links, 'admin');
    expect(screen.getByText('Ada Admin')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
    expect(within(nav).queryByText('Karts')).toBeNull();
  });

  it('puts the racer menu in a drawer on phone widths', async () => {
    setPhoneWidth(true);
    mockApi({ 'GET /auth/me': meReply(makeUser('racer', { displayName: 'Rae Racer' })) });
    renderApp('/home');
    expect(await screen.findByRole('heading', { name: 'Hello, Rae Racer' })).toBeInTheDocument();
    expect(screen.queryByRole('navigation', { name: 'Main' })).toBeNull();

    await userEvent.setup().click(screen.getByRole('button', { name: 'Open menu' }));
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expectMenu(
      within(nav)
        .getAllByRole('menuitem')
        .map((item) => item.textContent ?? ''),
      'racer',
    );
    expect(within(nav).queryByText('Users')).toBeNull();
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
  });
});
