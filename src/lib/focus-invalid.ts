import { useEffect, useRef, type RefObject } from 'react';

/**
 * Moves to the first answer the form marks invalid: on a long form the message beside it may be a
 * whole tablet screen above the send button. A group of tiles takes focus on its chosen tile, or
 * its first.
 */
function focusFirstInvalid(form: HTMLFormElement) {
  const invalid = form.querySelector<HTMLElement>('[aria-invalid="true"]');
  if (!invalid) return;
  const target = invalid instanceof HTMLFieldSetElement ? (invalid.querySelector<HTMLElement>('input:checked') ?? invalid.querySelector<HTMLElement>('input')) : invalid;
  // Centred, so the sticky header cannot cover it.
  target?.focus({ preventScroll: true });
  target?.scrollIntoView({ block: 'center' });
}

/**
 * Focuses the first invalid answer whenever one of the triggers changes: the browser's findings
 * set on a send, the server's answer. Typing changes neither, so focus never jumps while typing.
 */
export function useFocusFirstInvalid(...triggers: unknown[]): RefObject<HTMLFormElement | null> {
  const form = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (form.current) focusFirstInvalid(form.current);
    // The triggers are the dependencies: one per argument, as many on every render.
  }, triggers);
  return form;
}
