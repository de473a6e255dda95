'use client';

import { useState } from 'react';
import useSWRMutation from 'swr/mutation';
import type { PdfVerification } from '@/lib/certificates/verify-certificate-pdf';
import { certificatePdfFileSchema } from '@/lib/validation/certificate-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { VerificationReport } from './verification-report';

export const VERIFICATION_URL = '/api/certificates/verification';

class VerificationRequestError extends Error {}

async function uploadForVerification(url: string, { arg }: { arg: File }): Promise<PdfVerification> {
  const form = new FormData();
  form.append('file', arg);
  const response = await fetch(url, { method: 'POST', body: form });
  const body = (await response.json().catch(() => ({}))) as { error?: string; issues?: { message: string }[] };
  if (!response.ok) throw new VerificationRequestError(body.issues?.[0]?.message ?? body.error ?? `The check failed (HTTP ${response.status}).`);
  return body as unknown as PdfVerification;
}

/** Upload a certificate PDF; the server checks its signature, its bytes against the issued file and its status. */
export function VerifyUploadForm() {
  const [file, setFile] = useState<File | null>(null);
  const [fieldError, setFieldError] = useState<string | null>(null);
  const { trigger, data, error, isMutating, reset } = useSWRMutation(VERIFICATION_URL, uploadForVerification);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    reset();
    const parsed = certificatePdfFileSchema.safeParse(file);
    if (!parsed.success) return setFieldError(parsed.error.issues[0]?.message ?? 'Choose the certificate PDF file to verify.');
    setFieldError(null);
    await trigger(file as File).catch(() => undefined);
  }

  const message = fieldError ?? (error instanceof Error ? error.message : undefined);
  return (
    <div className="space-y-6">
      <form onSubmit={onSubmit} noValidate aria-labelledby="h-upload" className="max-w-lg">
        <FormField id="certificate-file" label="Certificate PDF" hint="The file is checked in memory and not kept. At most 5 MB." error={message}>
          <input id="certificate-file" type="file" accept="application/pdf,.pdf" className={inputClassName} aria-invalid={!!message} aria-describedby={message ? 'certificate-file-error' : 'certificate-file-hint'} onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
        </FormField>
        <button type="submit" className={buttonClassName} disabled={isMutating}>{isMutating ? 'Checking…' : 'Check the PDF'}</button>
      </form>
      {data ? <VerificationReport report={data} /> : null}
    </div>
  );
}
