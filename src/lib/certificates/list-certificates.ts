import 'server-only';
import { Op, type Order, type WhereOptions } from 'sequelize';
import { Certificate, Revision, Scheme, database } from '@/lib/db';
import type { CertificateStatus } from '@/lib/db/models/certificate';
import { type CertificateRegisterQuery, REGISTER_PAGE_SIZE } from '@/lib/validation/certificate-schemas';

function orderOf(query: CertificateRegisterQuery): Order {
  const direction = query.direction === 'asc' ? 'ASC' : 'DESC';
  const by: Record<CertificateRegisterQuery['sort'], string> = { number: 'number', scheme: 'scheme_reference', site: 'scheme_site', issued: 'issued_at', status: 'status' };
  return [[database().literal(by[query.sort]), direction], ['number', direction]];
}

/** The certificate register: search by scheme, site or number, by status and by issue date; sorted and paged. */
export async function listCertificates(query: CertificateRegisterQuery) {
  database();
  const like = `%${query.q}%`;
  const matchingSchemes = query.q
    ? (await Scheme.findAll({ where: { [Op.or]: ['reference', 'name', 'watercourse', 'site'].map((field) => ({ [field]: { [Op.like]: like } })) }, attributes: ['id'] })).map((s) => s.id)
    : [];
  const where: WhereOptions<Certificate>[] = [];
  if (query.q) where.push({ [Op.or]: [{ number: { [Op.like]: like } }, { schemeId: matchingSchemes }] });
  if (query.status) where.push({ status: query.status });
  if (query.from) where.push({ issuedAt: { [Op.gte]: `${query.from}T00:00:00.000Z` } });
  if (query.to) where.push({ issuedAt: { [Op.lte]: `${query.to}T23:59:59.999Z` } });
  const schemeColumn = (column: string) => database().literal(`(SELECT ${column} FROM schemes WHERE schemes.id = Certificate.scheme_id)`);
  const { rows, count } = await Certificate.findAndCountAll({
    where: { [Op.and]: where },
    attributes: { include: [[schemeColumn('reference'), 'scheme_reference'], [schemeColumn('site'), 'scheme_site']] },
    order: orderOf(query),
    limit: REGISTER_PAGE_SIZE,
    offset: (query.page - 1) * REGISTER_PAGE_SIZE,
  });
  const schemes = new Map((await Scheme.findAll({ where: { id: rows.map((c) => c.schemeId) } })).map((s) => [s.id, s]));
  const revisions = new Map((await Revision.findAll({ where: { id: rows.map((c) => c.revisionId) }, attributes: ['id', 'number'] })).map((r) => [r.id, r]));
  return {
    total: count,
    page: query.page,
    pages: Math.max(1, Math.ceil(count / REGISTER_PAGE_SIZE)),
    certificates: rows.map((c) => {
      const scheme = schemes.get(c.schemeId);
      return { id: c.id, number: c.number, status: c.status as CertificateStatus, issuedAt: c.issuedAt, revisionNumber: revisions.get(c.revisionId)?.number ?? null, scheme: scheme ? { reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site } : null };
    }),
  };
}
export type CertificateRegister = Awaited<ReturnType<typeof listCertificates>>;
export type RegisterEntry = CertificateRegister['certificates'][number];
