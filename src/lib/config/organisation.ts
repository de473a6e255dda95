// Who the portal speaks for: letters, their e-mails and reminders go out in this name, never the product's.
// From configuration only (README, "Settings"). No 'server-only': the pages read it too.

/** ORGANISATION_NAME, or the signed-in officer's own organisation, or a plain description of the office. */
export function organisationName(officerOrganisation?: string | null): string {
  return process.env.ORGANISATION_NAME?.trim() || officerOrganisation?.trim() || 'Landowner liaison office';
}

/** The address part of MAIL_FROM (a bare address or `Name <address>`). */
export function senderAddress(): string {
  const from = process.env.MAIL_FROM ?? 'no-reply@sillmark.invalid';
  return /<([^>]+)>/.exec(from)?.[1] ?? from.trim();
}

/** The From header of letters and reminders: the organisation's name with the configured sending address. */
export function organisationSender(officerOrganisation?: string | null): { name: string; address: string } {
  return { name: organisationName(officerOrganisation), address: senderAddress() };
}
