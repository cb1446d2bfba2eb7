/**
 * Hands an export to the user: the system share sheet (Web Share API, level 2 with files)
 * where the browser can share this file, otherwise a download. A share the user cancels is
 * not an error; a share the browser refuses falls back to a download.
 */

export type ShareOutcome = 'shared' | 'downloaded' | 'cancelled';

/** Saves `file` through a temporary link; the object URL is revoked after the click. */
export function downloadFile(file: File): void {
  const url = URL.createObjectURL(file);
  const a = document.createElement('a');
  a.href = url;
  a.download = file.name;
  a.rel = 'noopener';
  a.hidden = true;
  document.body.append(a);
  a.click();
  a.remove();
  // Revoke later: some browsers start the download only after the click handler returns.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** True when this browser can put `file` on the share sheet. */
export function canShareFile(file: File): boolean {
  return (
    typeof navigator.share === 'function' &&
    typeof navigator.canShare === 'function' &&
    navigator.canShare({ files: [file] })
  );
}

/** Shares `file` when possible (and wanted), otherwise downloads it. */
export async function shareOrDownload(
  file: File,
  options: { title: string; preferShare?: boolean },
): Promise<ShareOutcome> {
  if ((options.preferShare ?? true) && canShareFile(file)) {
    try {
      await navigator.share({ files: [file], title: options.title });
      return 'shared';
    } catch (err) {
      if (err instanceof DOMException && err.name === 'AbortError') return 'cancelled';
      // NotAllowedError (no user gesture left) or a refused type: fall back to a download.
    }
  }
  downloadFile(file);
  return 'downloaded';
}
