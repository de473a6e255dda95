import { describe, expect, it } from 'vitest';
import { neutraliseFormula, toSafeCsv } from '@/lib/csv/to-safe-csv';

describe('CSV export', () => {
  it('neutralises cells that a spreadsheet would run as formulas (OWASP CSV Injection)', () => {
    for (const hostile of ['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\tx', '\rx']) expect(neutraliseFormula(hostile)).toBe(`'${hostile}`);
    expect(neutraliseFormula('Mill Lane')).toBe('Mill Lane');
    expect(neutraliseFormula(-1.25)).toBe(-1.25);
  });

  it('quotes separators, quotes and line breaks per RFC 4180 and ends records with CRLF', () => {
    const csv = toSafeCsv(['label', 'level (m)'], [['Bridge, north "soffit"', 35.9], ['=HYPERLINK("x")', -0.5]]);
    expect(csv).toBe('label,level (m)\r\n"Bridge, north ""soffit""",35.9\r\n"\'=HYPERLINK(""x"")",-0.5\r\n');
  });
});
