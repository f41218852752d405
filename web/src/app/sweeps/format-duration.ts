/**
 * A duration as a person reads it on a progress line: "under 1 s", "42 s", "3 min 20 s",
 * "1 h 05 min". Seconds are rounded; a negative or non-finite duration is "—".
 *
 * @param seconds the duration, s
 * @returns the text
 * @example formatDuration(200) // '3 min 20 s'
 */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '—';
  if (seconds < 1) return 'under 1 s';
  const total = Math.round(seconds);
  if (total < 60) return `${total} s`;
  if (total < 3600) {
    const s = total % 60;
    return `${Math.floor(total / 60)} min${s ? ` ${s} s` : ''}`;
  }
  const minutes = Math.round(total / 60);
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}
