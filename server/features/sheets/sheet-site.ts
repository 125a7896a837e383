/**
 * The site that issues process sheets: company, site name and the code that prefixes sheet numbers
 * ("LC-PS-0001"). Demo data: Larkspur Coatings is an invented company (DESIGN.md).
 */
export const SHEET_SITE = Object.freeze({
  company: 'Larkspur Coatings',
  name: 'Larkspur Coatings, coating and casting plant',
  code: 'LC',
});

/** "LC-PS-0007": site code, "PS" for process sheet, a four-digit running number per site. */
export function sheetNumber(siteCode: string, runningNumber: number): string {
  return `${siteCode}-PS-${String(runningNumber).padStart(4, '0')}`;
}
