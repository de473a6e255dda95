import { describe, expect, it } from 'vitest';
import { formatCsvIssue, parseParcelsCsv } from '@/lib/parcels/parcels-csv';

const HEADER = 'parcel_reference,owner_name,postal_address,email,distance_from_m,distance_to_m,bank_side,ground_level_m,land_use';

describe('the parcels CSV parser', () => {
  it('reads a good file, columns in any order and any case, with a byte-order mark and empty optional cells', () => {
    const text = '\uFEFFDistance_To_M,PARCEL_REFERENCE,owner_name,postal_address,distance_from_m,bank_side\n250,HM-01,Ada Owner,"Mill House, Harrowfield",100,Both\n';
    const parsed = parseParcelsCsv(text);
    expect(parsed.issues).toEqual([]);
    expect(parsed.ok).toBe(true);
    expect(parsed.rows[0].parcel).toEqual({ reference: 'HM-01', ownerName: 'Ada Owner', postalAddress: 'Mill House, Harrowfield', email: '', distanceFromM: 100, distanceToM: 250, bankSide: 'both', groundLevelM: null, landUse: '' });
  });

  it('numbers each record by the line it starts on, even after a quoted address over two lines and a blank line', () => {
    const text = [HEADER, 'HM-01,A,"Line one', 'line two",,0,10,left,,', '', 'HM-02,B,Addr,,10,x,left,,'].join('\n');
    const parsed = parseParcelsCsv(text);
    expect(parsed.rows.map((r) => r.line)).toEqual([2, 5]);
    expect(parsed.issues).toEqual([{ line: 5, column: 'distance_to_m', message: 'must be a number of metres (distance upstream where the parcel ends) (found "x")' }]);
    expect(formatCsvIssue(parsed.issues[0])).toBe('Line 5, distance_to_m: must be a number of metres (distance upstream where the parcel ends) (found "x")');
  });

  it('names missing and unknown columns on line 1 and reads no rows then', () => {
    const parsed = parseParcelsCsv('parcel_reference,owner,postal_address\nHM-01,A,B\n');
    expect(parsed.rows).toEqual([]);
    expect(parsed.issues.map((i) => i.message)).toEqual([
      expect.stringMatching(/^column 2 "owner" is not a parcels column/),
      'the header has no owner_name column (required)',
      'the header has no distance_from_m column (required)',
      'the header has no distance_to_m column (required)',
      'the header has no bank_side column (required)',
    ]);
  });

  it('reports a wrong number of fields, a repeated reference and an empty file', () => {
    const parsed = parseParcelsCsv([HEADER, 'HM-01,A,B,,0,10,left,,', 'HM-01,C,D,,10,20,right,,', 'HM-03,E,F,,20,30,left'].join('\n'));
    expect(parsed.issues).toContainEqual({ line: 3, column: 'parcel_reference', message: 'repeats the reference "HM-01" of line 2' });
    expect(parsed.issues).toContainEqual({ line: 4, column: null, message: 'has 7 fields; the header has 9' });
    expect(parseParcelsCsv('').issues[0].message).toMatch(/the file is empty/);
    expect(parseParcelsCsv(`${HEADER}\n`).issues[0].message).toBe('the file has a header but no parcels');
    expect(parseParcelsCsv(`${HEADER}\nHM-01,"unclosed,B`).issues[0].message).toMatch(/not valid CSV/);
  });

  it('gives every field problem of a row at once, the distances checked against each other too', () => {
    const parsed = parseParcelsCsv(`${HEADER}\n,,,not-mail,-5,-10,upstream,high,`);
    const byColumn = Object.fromEntries(parsed.issues.map((i) => [i.column, i.message]));
    expect(byColumn.parcel_reference).toMatch(/is required/);
    expect(byColumn.owner_name).toMatch(/is required/);
    expect(byColumn.postal_address).toMatch(/is required/);
    expect(byColumn.email).toMatch(/e-mail address/);
    expect(byColumn.distance_from_m).toMatch(/must be 0 m or more/);
    expect(byColumn.bank_side).toMatch(/left, right or both/);
    expect(byColumn.ground_level_m).toMatch(/number of metres.*found "high"/);
  });
});
