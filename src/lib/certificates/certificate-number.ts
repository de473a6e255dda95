import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { Certificate } from '@/lib/db';

/**
 * The next number of the year, SMC-2026-0001 onwards. Drawn first in a read, for the file to be made under; drawn
 * again inside the issuing transaction, which SQLite runs IMMEDIATE (write lock from the start), where it must still
 * be the same: so two countersignatures cannot store the same number. UNIQUE guards it too.
 */
export async function nextCertificateNumber(issuedAt: string, transaction: Transaction): Promise<string> {
  const prefix = `SMC-${issuedAt.slice(0, 4)}-`;
  const numbers = await Certificate.findAll({ where: { number: { [Op.like]: `${prefix}%` } }, attributes: ['number'], transaction });
  const highest = numbers.reduce((max, c) => Math.max(max, Number(c.number.slice(prefix.length)) || 0), 0);
  return `${prefix}${String(highest + 1).padStart(4, '0')}`;
}
