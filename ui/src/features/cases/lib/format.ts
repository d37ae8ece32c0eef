const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** An ISO timestamp in the user's time zone ("1 Dec 2026, 22:25"); the text itself if it is not one. */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
}

const dayFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** A YYYY-MM-DD day as the user's calendar shows it ("1 Nov 2026"); the text itself if it is not one. */
export function formatDate(day: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  return m ? dayFormat.format(new Date(Number(m[1]), Number(m[2]) - 1, Number(m[3]))) : day;
}
