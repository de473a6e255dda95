// Public liveness probe: says the server answers, reads no data.
export function GET(): Response {
  return Response.json({ status: 'ok' });
}
