/**
 * What an editor reads when someone saved the study after they loaded it, e.g. "This study was
 * saved by Oskar Brandt on 2026-12-02 at 10:42 UTC (now version 4); reload it to see their
 * changes, then apply yours again". The time is given to the minute in UTC so that people in
 * different time zones read the same words.
 */
export function staleStudyMessage(last: {
  by: string | null;
  at: Date;
  version: number;
  sentVersion: number;
}): string {
  const iso = last.at.toISOString();
  const when = `on ${iso.slice(0, 10)} at ${iso.slice(11, 16)} UTC`;
  const who = last.by ? ` by ${last.by}` : '';
  if (last.sentVersion > last.version) {
    // A version from the future is a client bug or a copy from elsewhere; say what is stored.
    return (
      `Version ${last.sentVersion} of this study does not exist; it was last saved${who} ` +
      `${when} (version ${last.version}); reload it`
    );
  }
  return (
    `This study was saved${who} ${when} (now version ${last.version}); reload it to see ` +
    'their changes, then apply yours again'
  );
}
