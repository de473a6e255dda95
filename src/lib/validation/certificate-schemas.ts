import { z } from 'zod';
import { optionalIsoDateText } from './iso-date';
import { multiLineText, singleLineText } from './plain-text';

// Certificate numbers, the register's search, revocation and the uploaded PDF to verify.

export const CERTIFICATE_NUMBER_PATTERN = /^SMC-\d{4}-\d{4,}$/;
export const MAX_CERTIFICATE_PDF_BYTES = 5 * 1024 * 1024;

export const certificateNumberSchema = z
  .string()
  .trim()
  .toUpperCase()
  .min(1, 'Enter the certificate number printed on the certificate, for example SMC-2026-0001.')
  .max(40, 'A certificate number has at most 40 characters.')
  .regex(CERTIFICATE_NUMBER_PATTERN, 'A certificate number looks like SMC-2026-0001: the letters SMC, the year and a sequence number.');

export const verifyNumberSchema = z.object({ number: certificateNumberSchema });

export const CERTIFICATE_STATUSES = ['issued', 'superseded', 'revoked'] as const;
export const REGISTER_SORTS = ['number', 'scheme', 'site', 'issued', 'status'] as const;
export const REGISTER_PAGE_SIZE = 20;

const registerDate = (what: string) => optionalIsoDateText(what).default('');

export const certificateRegisterQuerySchema = z
  .object({
    q: singleLineText('the search').max(200, 'Search for at most 200 characters.').default(''),
    status: z.enum(['', ...CERTIFICATE_STATUSES], { message: 'Choose issued, superseded or revoked.' }).default(''),
    from: registerDate('issued on or after'),
    to: registerDate('issued on or before'),
    sort: z.enum(REGISTER_SORTS, { message: 'Sort by number, scheme, site, issued or status.' }).default('issued'),
    direction: z.enum(['asc', 'desc'], { message: 'Sort ascending or descending.' }).default('desc'),
    page: z.coerce.number({ message: 'The page must be a whole number.' }).int('The page must be a whole number.').min(1, 'Pages start at 1.').max(100000).default(1),
  })
  .refine((v) => !v.from || !v.to || v.from <= v.to, { path: ['to'], message: 'The "to" date must be on or after the "from" date.' });
export type CertificateRegisterQuery = z.infer<typeof certificateRegisterQuerySchema>;

export const revokeCertificateSchema = z.object({
  certificateId: z.string().trim().min(1, 'Choose the certificate to revoke.').max(64),
  reason: multiLineText('the reason for revoking').min(10, 'Give the reason for revoking (at least 10 characters): the verification page shows it.').max(1000, 'The reason has at most 1000 characters.'),
  confirmed: z.literal(true, { message: 'Tick the statement to confirm that this certificate is to be revoked for good.' }),
  password: z.string().min(1, 'Enter your password: revoking a certificate needs it again.').max(200, 'A password has at most 200 characters.'),
});
export type RevokeCertificateInput = z.infer<typeof revokeCertificateSchema>;

/** The uploaded certificate: a PDF file of bounded size. Used by the upload form and by the verification route. */
export const certificatePdfFileSchema = z
  .custom<Blob>((value) => typeof Blob !== 'undefined' && value instanceof Blob, { message: 'Choose the certificate PDF file to verify.' })
  .refine((file) => file.size > 0, { message: 'The chosen file is empty (0 bytes).' })
  .refine((file) => file.size <= MAX_CERTIFICATE_PDF_BYTES, { message: `The file is larger than ${MAX_CERTIFICATE_PDF_BYTES / 1024 / 1024} MB; a Sillmark certificate is far smaller.` });
