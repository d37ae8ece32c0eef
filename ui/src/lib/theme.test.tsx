import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Classes } from '@blueprintjs/core';
import { describe, expect, it } from 'vitest';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../test-utils';
import { THEME_STORAGE_KEY } from './theme';

const root = () => document.documentElement;

describe('theme', () => {
  it('remembers the choice in localStorage and restores it on the next visit', async () => {
    setPhoneWidth(false);
    mockApi({ 'GET /auth/me': meReply(null) });
    const first = renderApp('/');
    expect(root()).not.toHaveClass(Classes.DARK);

    await userEvent.setup().click(await screen.findByRole('button', { name: /switch to dark theme/i }));
    expect(root()).toHaveClass(Classes.DARK);
    expect(window.localStorage.getItem(THEME_STORAGE_KEY)).toBe('dark');
    first.unmount();

    // A new visit: nothing passed in, the stored choice wins.
    root().classList.remove(Classes.DARK);
    renderApp('/');
    expect(root()).toHaveClass(Classes.DARK);
    await userEvent.setup().click(await screen.findByRole('button', { name: /switch to light theme/i }));
    expect(root()).not.toHaveClass(Classes.DARK);
    expect(window.localStorage.getItem(THEME_STORAGE_KEY)).toBe('light');
  });

  it('puts the dark class on overlays too (the phone menu drawer)', async () => {
    setPhoneWidth(true);
    window.localStorage.setItem(THEME_STORAGE_KEY, 'dark');
    mockApi({ 'GET /auth/me': meReply(makeUser('coach')) });
    renderApp('/home');
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Open menu' }));
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    const portal = nav.closest(`.${Classes.PORTAL}`);
    expect(portal).not.toBeNull();
    await waitFor(() => expect(portal).toHaveClass(Classes.DARK));
  });
});
