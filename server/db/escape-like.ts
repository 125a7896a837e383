/** Escape LIKE/ILIKE wildcards so a search for "50%" matches the text "50%" literally. */
export function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (ch) => `\\${ch}`);
}
