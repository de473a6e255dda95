// The recipient's address block, placed for a window envelope.
//
// Position: DIN 5008 (Deutsches Institut für Normung, "Schreib- und Gestaltungsregeln für die Text- und
// Informationsverarbeitung", 2020), form B: an address field 85 mm wide and 45 mm high whose top is 45 mm from the top
// of an A4 sheet and whose left edge is 20 mm from the left; its upper 17.7 mm are for a return line and notes, the
// address itself takes the lower 27.3 mm (six lines). Folded in three, the sheet then shows that field in the window
// of a DL envelope (110 × 220 mm) with a 90 × 45 mm window 20 mm from the left and 15 mm from the bottom — the usual
// DL window envelope in the UK, as common practice. (Dimensions recalled from memory of the standard.)

const MM = 72 / 25.4;
export const ADDRESS_FIELD = { leftPt: 20 * MM, topPt: 45 * MM, widthPt: 85 * MM, heightPt: 45 * MM, addressTopPt: (45 + 17.7) * MM } as const;
/** Lines the address part of the field holds at the letter's 9.5 pt type (27.3 mm / 4.5 mm per line). */
export const MAX_ADDRESS_LINES = 6;

/**
 * The name and the postal address, one item a line. The register keeps an address on one line with commas (or
 * semicolons, or line breaks) between its parts; each part goes on its own line. When there are more parts than the
 * window shows, the first ones are joined so that the town and postcode, which come last, stay on lines of their own.
 */
export function addressLines(name: string, postalAddress: string): string[] {
  const parts = postalAddress.split(/\r?\n|;|,/).map((p) => p.trim()).filter(Boolean);
  const room = MAX_ADDRESS_LINES - 1;
  while (parts.length > room) parts.splice(0, 2, `${parts[0]}, ${parts[1]}`);
  return [name.trim(), ...parts];
}
