const clockFormat = new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit' });
const dayFormat = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
});

/** "14:05" today, "3 Dec, 14:05" on another day. */
export function when(iso: string | undefined | null): string {
  if (!iso) return '—';
  const date = new Date(iso);
  const today = new Date().toDateString() === date.toDateString();
  return (today ? clockFormat : dayFormat).format(date);
}
