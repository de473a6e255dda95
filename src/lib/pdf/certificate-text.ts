// Text for the certificate PDF. The embedded IBM Plex files carry the latin subset only, so every string passes
// through pdfText(): Greek letters become their names, comparison signs become ASCII, anything else unknown a "?".

const WORDS: Record<string, string> = {
  '≤': '<=', '≥': '>=', '≈': '~', '≠': '!=', '√': 'sqrt', '→': '->', '←': '<-', '⇢': '->', '✔': 'yes', '✖': 'no', '⚠': '!',
  α: 'alpha', β: 'beta', γ: 'gamma', δ: 'delta', Δ: 'Delta', ε: 'epsilon', η: 'eta', θ: 'theta', κ: 'kappa', λ: 'lambda',
  μ: 'mu', ν: 'nu', π: 'pi', ρ: 'rho', σ: 'sigma', τ: 'tau', φ: 'phi', χ: 'chi', ψ: 'psi', ω: 'omega', ξ: 'xi', ζ: 'zeta',
};

// Printable ASCII, Latin-1, and the few punctuation marks the fonts have (dashes, quotes, ellipsis, minus).
const IN_FONT = /[\u0020-\u007e\u00a0-\u00ff\u2013\u2014\u2018\u2019\u201c\u201d\u2026\u2212]/u;

export function pdfText(text: string): string {
  let out = '';
  for (const char of text) {
    if (IN_FONT.test(char)) out += char;
    else if (WORDS[char] !== undefined) out += WORDS[char];
    else {
      // Compatibility forms first: subscript and superscript digits, ligatures, narrow spaces.
      const plain = char.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
      out += [...plain].every((c) => IN_FONT.test(c)) && plain !== '' ? plain : '?';
    }
  }
  return out;
}

export function fixed(value: number | null | undefined, digits = 3): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '-' : value.toFixed(digits);
}

export function withUnit(value: number | null | undefined, unit: string, digits = 3): string {
  const text = fixed(value, digits);
  return text === '-' ? text : `${text} ${unit}`;
}

/** "2026-03-14 09:30 UTC" from an ISO timestamp. */
export function utcDateTime(iso: string): string {
  return `${iso.replace('T', ' ').slice(0, 16)} UTC`;
}

export function lengthUnit(units: 'SI' | 'US'): string {
  return units === 'US' ? 'ft' : 'm';
}

export function dischargeUnit(units: 'SI' | 'US'): string {
  return units === 'US' ? 'ft³/s' : 'm³/s';
}

/** The datum levels are measured from, as the scheme names it; a scheme without one still says that levels have a datum. */
export function datumName(datum: string | null | undefined): string {
  return datum?.trim() ? datum.trim() : 'the scheme datum (not named)';
}

/** "m above Ordnance Datum Newlyn": the unit of every level. */
export function levelUnit(unit: string, datum: string | null | undefined): string {
  return `${unit} above ${datumName(datum)}`;
}

/** "32.400 m above Ordnance Datum Newlyn". */
export function levelText(value: number | null | undefined, unit: string, datum: string | null | undefined, digits = 3): string {
  return withUnit(value, levelUnit(unit, datum), digits);
}

/** "1.200 m above the bed": a depth or height is above the bed, never above the datum. */
export function heightText(value: number | null | undefined, unit: string, digits = 3): string {
  return withUnit(value, `${unit} above the bed`, digits);
}

/** "0.00060 m/m (1 in 1667)". */
export function slopeText(slope: number): string {
  if (slope === 0) return '0 m/m (horizontal)';
  const oneIn = Math.abs(1 / slope);
  return `${slope.toFixed(5)} m/m (${slope < 0 ? 'adverse, rising downstream: ' : ''}1 in ${oneIn >= 100 ? oneIn.toFixed(0) : oneIn.toFixed(1)})`;
}

export function percent(value: number, digits = 1): string {
  return `${Number.isInteger(value) ? value.toFixed(0) : value.toFixed(digits)} %`;
}
