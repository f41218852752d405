/**
 * Offers text to the user as a downloaded file, made in the page (no round trip to the server:
 * the numbers are already here).
 *
 * @param filename the name the browser suggests
 * @param text the file's content
 * @param type its media type, e.g. `text/csv`
 */
export function saveTextFile(filename: string, text: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: `${type};charset=utf-8` }));
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.rel = 'noopener';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoked after the click has been handled; an immediate revoke can cancel the download.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** A file name from free text: letters, digits and dashes only. */
export function fileSlug(text: string): string {
  return (
    text
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'study'
  );
}
