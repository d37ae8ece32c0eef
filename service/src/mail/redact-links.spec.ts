import { describe, expect, it } from 'vitest';
import { redactTokenLinks } from './redact-links.js';

const msg = (kind: string, url: string) => ({
  kind,
  text: `Hello\n\nOpen: ${url}\n\n-- \nFuelwright`,
  html: `<p>Hello</p><p><a href="${url}" style="x">Open</a></p>`,
});

describe('redactTokenLinks', () => {
  it.each([
    ['invitation', 'http://app.test/invitations/AbC-12_x', 'http://app.test/invitations/[link hidden]'],
    ['email-verification', 'http://app.test/verify-email?token=AbC-12_x', 'http://app.test/verify-email?token=[link hidden]'],
    ['password-reset', 'http://app.test/reset-password?token=AbC-12_x', 'http://app.test/reset-password?token=[link hidden]'],
  ])('hides the token of a %s link in both parts', (kind, url, hidden) => {
    const out = redactTokenLinks(msg(kind, url));
    expect(out.text).toContain(`Open: ${hidden}\n`);
    expect(out.html).toContain(`href="${hidden}"`);
    expect(out.text + out.html).not.toContain('AbC-12_x');
  });

  it('leaves messages without a secret as they are', () => {
    const m = msg('comment', 'http://app.test/cases/5b1c3c2e-0000-4000-8000-000000000000');
    expect(redactTokenLinks(m)).toBe(m);
  });
});
