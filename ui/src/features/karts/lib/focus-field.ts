/** Moves the focus to a field by id: the input itself, or the first control inside a group. */
export function focusField(id: string): void {
  const element = document.getElementById(id);
  if (!element) return;
  if (element.matches('input, textarea, select, button')) element.focus();
  else element.querySelector<HTMLElement>('input, textarea, select, button')?.focus();
}
