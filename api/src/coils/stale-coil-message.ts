/**
 * What an editor reads when someone else saved the coil since they loaded it, e.g. "This coil was
 * changed by Oskar Brandt at 10:42 UTC (now version 4); reload to see their changes". The date is
 * added when the last save was not today (UTC).
 */
export function staleCoilMessage(last: {
  by: string | null;
  at: Date;
  version: number;
  sentVersion: number;
  now?: Date;
}): string {
  const iso = last.at.toISOString();
  const today = (last.now ?? new Date()).toISOString().slice(0, 10);
  const day = iso.slice(0, 10) === today ? '' : ` on ${iso.slice(0, 10)}`;
  const who = last.by ? ` by ${last.by}` : '';
  if (last.sentVersion > last.version) {
    // A version from the future is a client bug or a copy from elsewhere; say what is stored.
    return (
      `Version ${last.sentVersion} of this coil does not exist; it was last changed${who}` +
      `${day} at ${iso.slice(11, 16)} UTC (version ${last.version}); reload it`
    );
  }
  return (
    `This coil was changed${who}${day} at ${iso.slice(11, 16)} UTC ` +
    `(now version ${last.version}); reload to see their changes`
  );
}
