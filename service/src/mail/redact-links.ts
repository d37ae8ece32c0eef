import type { OutboxMessageDto } from '@fuelwright/shared';

/** Kinds of message whose link carries a single-use secret (whoever reads the link can use it). */
export const TOKEN_KINDS = ['invitation', 'email-verification', 'password-reset'] as const;

const TOKEN_LINK = /(\/(?:invitations\/|verify-email\?token=|reset-password\?token=))[A-Za-z0-9_%.~-]+/g;
export const REDACTED = '[link hidden]';

/**
 * The outbox as an admin may see it when the messages went to real inboxes: the token in an
 * invitation, verification or reset link is replaced, so reading the outbox grants nothing.
 * Other kinds carry no secret (an unsubscribe link only turns a notice off) and are left alone.
 */
export function redactTokenLinks<M extends Pick<OutboxMessageDto, 'kind' | 'text' | 'html'>>(m: M): M {
  if (!(TOKEN_KINDS as readonly string[]).includes(m.kind)) return m;
  const hide = (s: string) => s.replace(TOKEN_LINK, `$1${REDACTED}`);
  return { ...m, text: hide(m.text), html: hide(m.html) };
}
