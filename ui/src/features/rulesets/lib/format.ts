const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** A moment as a local date and time (the text itself when it is not a date). */
export const when = (iso: string) => (Number.isNaN(new Date(iso).getTime()) ? iso : dateTime.format(new Date(iso)));

/** A share 0..1 as a percent with one decimal. */
export const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
