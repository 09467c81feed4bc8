/** An ILIKE pattern matching `text` anywhere, with the wildcard characters in it taken literally. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
