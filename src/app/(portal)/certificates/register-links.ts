import type { CertificateRegisterQuery } from '@/lib/validation/certificate-schemas';

/** The register's address with some of its query changed: sorting and paging keep the search. */
export function registerHref(query: CertificateRegisterQuery, change: Partial<CertificateRegisterQuery>): string {
  const next = { ...query, ...change };
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(next)) if (value !== '' && value !== undefined) params.set(key, String(value));
  return `/certificates?${params.toString()}`;
}

/** Clicking a column sorts by it; clicking the sorted column again reverses the order. */
export function sortHref(query: CertificateRegisterQuery, sort: CertificateRegisterQuery['sort']): string {
  const direction = query.sort === sort ? (query.direction === 'asc' ? 'desc' : 'asc') : sort === 'issued' ? 'desc' : 'asc';
  return registerHref(query, { sort, direction, page: 1 });
}
