/** A positive whole page number from the URL; anything else means page 1. */
export function readPage(params: URLSearchParams, key = 'page'): number {
  const value = Number(params.get(key));
  return Number.isInteger(value) && value >= 1 && value <= 100_000 ? value : 1;
}

/** A trimmed text filter from the URL, or undefined when absent or blank. */
export function readText(params: URLSearchParams, key: string): string | undefined {
  const value = params.get(key)?.trim();
  return value ? value : undefined;
}

/**
 * Returns new search params with the given values set (blank/undefined removed). Changing a
 * filter goes back to page 1 unless the page itself is being set.
 */
export function withParams(params: URLSearchParams, changes: Record<string, string | number | undefined>): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined || value === '') next.delete(key);
    else next.set(key, String(value));
  }
  if (!('page' in changes)) next.delete('page');
  return next;
}
