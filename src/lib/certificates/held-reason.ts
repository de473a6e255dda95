/** Why a letter of a revoked revision is held: shown beside the letter wherever its state is shown. */
export function heldReason(certificateNumber: string): string {
  return `Held, not sent: certificate ${certificateNumber} of this revision was revoked.`;
}
