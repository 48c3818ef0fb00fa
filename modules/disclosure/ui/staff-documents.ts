// Staff documents (floor tags, signed copies) need the session's token, so they are fetched here
// and handed to the browser as a blob rather than linked to directly.
import { errorMessage, UNREACHABLE } from './public-disclosure';

export type DocumentMode = 'open' | 'download';

/**
 * Fetches a PDF with the Bearer token and opens it in a new tab (to print) or saves it.
 * The tab is opened before the fetch, while the tap still counts as the user's, so no pop-up blocker stops it.
 * Resolves to null, or the problem in words.
 */
export async function openStaffPdf(path: string, token: string | null, filename: string, mode: DocumentMode): Promise<string | null> {
  if (typeof window === 'undefined') return 'Documents open in a browser only.';
  const tab = mode === 'open' ? window.open('', '_blank') : null;
  if (tab) tab.document.title = 'Preparing the document…';
  let response: Response;
  try {
    response = await fetch(path, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  } catch {
    tab?.close();
    return UNREACHABLE;
  }
  if (!response.ok) {
    tab?.close();
    return errorMessage(response, 'The document could not be made');
  }
  const url = URL.createObjectURL(await response.blob());
  if (tab) {
    tab.location.href = url;
  } else {
    const a = document.createElement('a');
    a.href = url;
    a.download = filename;
    document.body.appendChild(a);
    a.click();
    a.remove();
  }
  // The tab has read the blob by then; the address is freed afterwards.
  setTimeout(() => URL.revokeObjectURL(url), 120_000);
  return null;
}
