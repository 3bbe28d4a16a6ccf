// Converts between a datetime-local field's value (the browser's own time) and an instant the API takes.
const pad = (n: number) => String(n).padStart(2, '0');

export function localInputValue(date: Date): string {
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}

/** Empty or unreadable input gives '' so the server names the field. */
export function instantFromInput(value: string): string {
  const ms = Date.parse(value);
  return Number.isNaN(ms) ? '' : new Date(ms).toISOString();
}
