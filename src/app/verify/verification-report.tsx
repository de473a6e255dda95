import type { PdfVerification } from '@/lib/certificates/verify-certificate-pdf';
import { StatusIcon } from '@/components/ui/status-icon';
import { CertificateStatusCard } from './certificate-status-card';

function Check({ ok, label }: { ok: boolean; label: string }) {
  return (
    <li className={ok ? 'text-verdict-pass' : 'font-semibold text-verdict-fail'}>
      <StatusIcon name={ok ? 'pass' : 'fail'} className="mr-1" />
      {label}: {ok ? 'yes' : 'no'}
    </li>
  );
}

/** The outcome of checking an uploaded PDF, point by point, then the certificate it is (or claims to be). */
export function VerificationReport({ report }: { report: PdfVerification }) {
  return (
    <div className="space-y-4" data-testid="verification-report">
      <p role="status" className={`rounded border-l-4 bg-white/70 px-4 py-3 font-semibold ${report.authentic ? 'border-verdict-pass text-verdict-pass' : 'border-verdict-fail text-verdict-fail'}`}>
        <StatusIcon name={report.authentic ? 'pass' : 'fail'} className="mr-1" />
        {report.authentic ? 'Authentic and current: this is the certificate the portal issued, unaltered, and it still stands.' : 'Not verified: do not rely on this file. The reasons are listed below.'}
      </p>
      <ul className="space-y-1 text-sm">
        <Check ok={report.signatureValid} label="The digital signature is valid" />
        <Check ok={report.coversWholeDocument} label="The signature covers the whole document" />
        <Check ok={report.signedByPortal} label="It was signed by the Sillmark signing identity" />
        <Check ok={report.unaltered} label="The file is unaltered (identical to the one issued)" />
        <Check ok={report.current} label="The certificate is current (not superseded or revoked)" />
      </ul>
      {report.problems.length ? <ul className="list-disc pl-5 text-sm">{report.problems.map((p) => <li key={p}>{p}</li>)}</ul> : null}
      <p className="num break-all text-xs text-ink-faint">SHA-256 of the uploaded file: {report.sha256}</p>
      {report.certificate ? (
        <>
          <p className="text-sm font-semibold">{report.unaltered ? 'The certificate this file is:' : `The file names certificate ${report.certificate.number}, but it is not the file issued. The certificate on record is:`}</p>
          <CertificateStatusCard certificate={report.certificate} />
        </>
      ) : null}
    </div>
  );
}
