import { z } from 'zod';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { indexQuery, queryOrThrow } from '@/lib/http/query-params';
import { outboxAttachment } from '@/lib/mail/list-outbox';

const attachmentQuery = z.object({ n: indexQuery('the attachment’s position in the message') });

/** GET ?n=<position>: one attachment of a message the local SMTP server kept, to open (a letter's PDF, say). */
export const GET = authorizedRoute<{ id: string }>(['admin'], async (request, _user, { id }) => {
  const { n } = queryOrThrow(attachmentQuery, request);
  const { content, contentType, filename } = await outboxAttachment({ messageId: id, index: n });
  // Only a PDF opens in the browser; anything else is saved, never rendered in the portal's origin.
  const disposition = contentType === 'application/pdf' ? 'inline' : 'attachment';
  return new Response(new Uint8Array(content), { headers: { 'content-type': contentType === 'application/pdf' ? contentType : 'application/octet-stream', 'content-disposition': `${disposition}; filename="${filename}"`, 'cache-control': 'private, no-store', 'x-content-type-options': 'nosniff' } });
});
