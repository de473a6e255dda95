// How a revision's state reads on screen once its certificate may have been revoked; shared by server and client pages.

export function revisionStanding({ status, revoked }: { status: string; revoked: boolean }): string {
  return revoked ? `${status}, certificate revoked` : status;
}
