/** The three verdicts a reading can get, in QuietLayer's words. */
export const readingFlagValues = ['quiet', 'close', 'over'] as const;
export type ReadingFlag = (typeof readingFlagValues)[number];
export const readingFlagLabels: Readonly<Record<ReadingFlag, string>> = Object.freeze({ quiet: 'Quiet', close: 'Close', over: 'Over' });

/**
 * Flag of one reading from its onset margin.
 *
 * ## Method
 * Over when λ* < 1 (cells can set in at this thickness); Close when 1 ≤ λ* < the check's alert
 * threshold (default 1.25, the layer check's amber band); Quiet otherwise, including no onset at all
 * (margin null = infinite). The same rule as the layer check's status, so a reading at the released
 * thickness carries the released check's verdict.
 *
 * @param margin - onset margin λ* [-]; null when no onset is possible
 * @param alertThreshold - the check's alert threshold [-], ≥ 1
 * @returns 'quiet' | 'close' | 'over'
 * @example readingFlag(1.1, 1.25) // 'close'
 */
export function readingFlag(margin: number | null, alertThreshold: number): ReadingFlag {
  if (margin === null || margin >= alertThreshold) return 'quiet';
  return margin >= 1 ? 'close' : 'over';
}
