/** A short, single-line excerpt of a value someone typed, so a message never echoes back a whole (possibly huge) input. */
export function excerpt(text: string, max = 40): string {
  const line = text.slice(0, max + 1).replace(/\s+/g, ' ');
  return line.length > max ? `${line.slice(0, max)}…` : line;
}
