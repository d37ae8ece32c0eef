/** Phone widths (the same breakpoint as app.css): cards instead of tables. */
export const PHONE_QUERY = '(max-width: 767px)';
