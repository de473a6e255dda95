import { describe, expect, it } from 'vitest';
import { MAX_ADDRESS_LINES, addressLines } from '@/lib/letters/letter-address';

// Invented Harrowfield addresses (the demo scenario).
describe('the address block of a letter', () => {
  it('puts each part of the register’s one-line address on its own line, under the name', () => {
    expect(addressLines('Edith Lowther', 'Weir Meadow Farm, Mill Lane, Harrowfield, HF3 2WE')).toEqual(['Edith Lowther', 'Weir Meadow Farm', 'Mill Lane', 'Harrowfield', 'HF3 2WE']);
    expect(addressLines(' Osric Penrose ', 'Upper Wendle Farm\nUpper Wendle;  HF4 7UW ')).toEqual(['Osric Penrose', 'Upper Wendle Farm', 'Upper Wendle', 'HF4 7UW']);
  });

  it('never needs more lines than the window shows, keeping the town and postcode on their own', () => {
    const lines = addressLines('Wendle Osier Growers Ltd', 'Accounts, Unit 4, Riverside Works, Tannery Row, Low Harrowfield, Harrowfield, HF3 1AB');
    expect(lines).toHaveLength(MAX_ADDRESS_LINES);
    expect(lines.slice(-2)).toEqual(['Harrowfield', 'HF3 1AB']);
    expect(lines[1]).toBe('Accounts, Unit 4, Riverside Works');
  });
});
