/**
 * Whether every number in a result is finite. JSON has no NaN or Infinity (Response.json would
 * quietly write null), so a result with one is treated as an engine failure, not sent.
 */
export function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}
