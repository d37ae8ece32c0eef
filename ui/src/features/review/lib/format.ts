const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** An ISO timestamp in the viewer's time zone ("1 Dec 2026, 22:25"); the text itself if it is not one. */
export function formatWhen(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
}

const ROLE_LABELS: Record<string, string> = { racer: 'Racer', coach: 'Coach', shop: 'Shop', admin: 'Admin' };

/** "Coach", "Shop"…; empty for an unknown or missing role. */
export function roleLabel(role: string | null | undefined): string {
  return role ? (ROLE_LABELS[role] ?? '') : '';
}

/** "62%" (as the case list writes it) */
export function formatPercent(probability: number): string {
  return `${Math.round(probability * 100)}%`;
}
