/**
 * Copies text, falling back to the old selection-based command: the Clipboard API is missing
 * over plain http, which is how a tablet often reaches a pit server. The fallback copies
 * whatever `input` holds, so the caller passes the field showing the text.
 */
export async function copyText(text: string, input: HTMLInputElement | null): Promise<boolean> {
  try {
    if (navigator.clipboard && window.isSecureContext) {
      await navigator.clipboard.writeText(text);
      return true;
    }
  } catch {
    // Permission refused: try the selection route below.
  }
  if (!input) return false;
  input.focus();
  input.select();
  return document.execCommand('copy');
}
