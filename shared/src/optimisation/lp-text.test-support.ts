/** Test support: every line of the LP text stays short and uses only names the LP format accepts. */
export function lpTextColumnsValid(text: string): boolean {
  return text.split('\n').every((line) => line.length <= 255 && /^[\sA-Za-z0-9_:.+\-<>=e]*$/.test(line));
}
