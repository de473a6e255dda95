/**
 * Whether a request is a browser's or Next's speculative prefetch rather than a person asking for the response.
 * A download answered to a prefetch would be written to the audit trail although nobody received the file.
 */
export function isPrefetch(request: Request): boolean {
  const { headers } = request;
  if (headers.get('next-router-prefetch') !== null) return true;
  return [headers.get('purpose'), headers.get('sec-purpose')].some((value) => value !== null && /\bprefetch\b/i.test(value));
}
