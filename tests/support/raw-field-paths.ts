// What a case-file path looks like when it leaks onto a screen: "control.sillHeight", "limits[0].label", "[0]".
const TOP_LEVEL = ['reach', 'events', 'control', 'existingControl', 'limits', 'profile', 'sizing', 'sensitivity', 'section', 'withoutScheme'];
const DOTTED = new RegExp(`\\b(${TOP_LEVEL.join('|')})(\\.[A-Za-z]|\\[\\d)`);
const CAMEL_KEYS = /\b(sillHeight|crestLength|distanceUpstream|annualExceedanceProbability|maxLevel|bedLevelAtControl|bedSlope|manningN|sillmark-case)\b/;

/** The raw paths found in a text; empty when it names every field in words. */
export function rawFieldPaths(text: string): string[] {
  const found: string[] = [];
  for (const pattern of [DOTTED, CAMEL_KEYS, /\[\d+\]/]) {
    const match = pattern.exec(text);
    if (match) found.push(match[0]);
  }
  return found;
}
