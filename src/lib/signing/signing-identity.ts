import 'server-only';
import { randomBytes } from 'node:crypto';
import { link, mkdir, readFile, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';
import forge from 'node-forge';
import { dataDirectory } from '@/lib/db/database-path';
import { signingIdentityOffThread } from '@/lib/pdf-pool/render-off-thread';
import { certificateFingerprint } from './certificate-fingerprint';

/** The portal's signing identity: what a hosted signing service would hold for it. */
export interface SigningIdentity {
  p12: Buffer;
  passphrase: string;
  certificatePem: string;
  /** SHA-256 of the certificate's DER encoding, lowercase hex. */
  fingerprint: string;
  subjectName: string;
}

interface StoredIdentity {
  passphrase: string;
  p12Base64: string;
  certificatePem: string;
}

const cache = globalThis as unknown as { sillmarkSigningIdentity?: Map<string, Promise<SigningIdentity>> };

/** Where the identity lives: under the data directory, which git ignores; never under public/. */
export function signingIdentityFile(): string {
  return dataDirectory('signing', 'identity.json');
}

function fromStored(stored: StoredIdentity): SigningIdentity {
  const certificate = forge.pki.certificateFromPem(stored.certificatePem);
  const commonName = certificate.subject.getField('CN');
  return {
    p12: Buffer.from(stored.p12Base64, 'base64'),
    passphrase: stored.passphrase,
    certificatePem: stored.certificatePem,
    fingerprint: certificateFingerprint(certificate),
    subjectName: typeof commonName?.value === 'string' ? commonName.value : 'Sillmark',
  };
}

async function createOnce(file: string): Promise<void> {
  await mkdir(path.dirname(file), { recursive: true, mode: 0o700 });
  const passphrase = randomBytes(24).toString('base64url');
  // Making the RSA key and the PKCS#12 bag is CPU work: it runs on the PDF pool, as signing does.
  const created = await signingIdentityOffThread(passphrase);
  const temporary = `${file}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
  await writeFile(temporary, JSON.stringify({ passphrase, p12Base64: Buffer.from(created.p12).toString('base64'), certificatePem: created.certificatePem }), { mode: 0o600 });
  // link() refuses to replace an existing file, so when two processes start at once the first identity wins.
  await link(temporary, file).catch((error: NodeJS.ErrnoException) => {
    if (error.code !== 'EEXIST') throw error;
  });
  await unlink(temporary);
}

async function load(file: string): Promise<SigningIdentity> {
  const text = await readFile(file, 'utf8').catch((error: NodeJS.ErrnoException) => (error.code === 'ENOENT' ? null : Promise.reject(error)));
  if (text !== null) return fromStored(JSON.parse(text) as StoredIdentity);
  await createOnce(file);
  return fromStored(JSON.parse(await readFile(file, 'utf8')) as StoredIdentity);
}

/** The identity, created on first use (a self-signed certificate and key) and kept for every later signature. */
export function signingIdentity(): Promise<SigningIdentity> {
  const file = signingIdentityFile();
  cache.sillmarkSigningIdentity ??= new Map();
  let identity = cache.sillmarkSigningIdentity.get(file);
  if (!identity) {
    identity = load(file);
    identity.catch(() => cache.sillmarkSigningIdentity?.delete(file));
    cache.sillmarkSigningIdentity.set(file, identity);
  }
  return identity;
}
