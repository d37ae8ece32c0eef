import type { NoticeKind } from '@fuelwright/shared';

export type MailKind = NoticeKind | 'email-verification' | 'password-reset' | 'shared-notice';

export interface MailContent {
  subject: string;
  /** Paragraphs of plain text; links are given separately so both parts carry them. */
  paragraphs: string[];
  action?: { label: string; url: string };
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Renders both parts of a message; user text is escaped in the HTML part, never trusted. */
export function renderMail(content: MailContent, unsubscribeUrl?: string): { subject: string; text: string; html: string } {
  const textParts = [...content.paragraphs];
  if (content.action) textParts.push(`${content.action.label}: ${content.action.url}`);
  textParts.push('-- \nFuelwright');
  if (unsubscribeUrl) textParts.push(`Stop these e-mails: ${unsubscribeUrl}`);
  const htmlParas = content.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n');
  const action = content.action
    ? `<p><a href="${escapeHtml(content.action.url)}" style="background:#2d72d2;color:#fff;padding:10px 16px;border-radius:4px;text-decoration:none">${escapeHtml(content.action.label)}</a></p>`
    : '';
  const footer = `<p style="color:#5f6b7c;font-size:12px">Fuelwright${unsubscribeUrl ? ` · <a href="${escapeHtml(unsubscribeUrl)}">Stop these e-mails</a>` : ''}</p>`;
  const html = `<!doctype html><html><body style="font-family:'Noto Sans',Arial,sans-serif;line-height:1.5">${htmlParas}${action}${footer}</body></html>`;
  return { subject: content.subject, text: textParts.join('\n\n'), html };
}
