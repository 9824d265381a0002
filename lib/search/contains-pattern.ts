/** A LIKE/ILIKE pattern matching text that contains the words as typed, % and _ included literally. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (character) => `\\${character}`)}%`;
}
