import { useRef, useState } from 'react';
import type { CreatedScreenJson } from '@shared/schemas/screens';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { controlClass } from '../../../components/ui/field';
import { CheckIcon, CopyIcon } from '../../../components/ui/icons';
import { copyText } from '../../../lib/copy-text';

type CopyState = 'idle' | 'copied' | 'failed';

/** The one moment a screen's link exists in clear: the server keeps only a hash of its token. */
export function ScreenLinkDialog({ screen, onClose }: { screen: CreatedScreenJson | null; onClose: () => void }) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [copy, setCopy] = useState<CopyState>('idle');
  const url = screen?.path ? `${window.location.origin}${screen.path}` : null;

  async function copyUrl() {
    if (!url) return;
    setCopy((await copyText(url, inputRef.current)) ? 'copied' : 'failed');
  }

  function close() {
    setCopy('idle');
    onClose();
  }

  return (
    <Dialog open={screen !== null} title={screen ? `Link for ${screen.name}` : ''} onClose={close} actions={<Button onClick={close}>Done</Button>}>
      {screen && url && (
        <>
          <p>Open this address in the browser of the pit TV. It needs no sign-in:</p>
          <div className="flex flex-wrap gap-2">
            <label htmlFor="screen-link" className="sr-only">
              Screen link
            </label>
            <input
              id="screen-link"
              ref={inputRef}
              readOnly
              value={url}
              onFocus={(event) => event.target.select()}
              className={`${controlClass} min-w-0 flex-1 basis-72 font-semibold`}
            />
            <Button variant="secondary" onClick={copyUrl} icon={copy === 'copied' ? <CheckIcon /> : <CopyIcon />}>
              {copy === 'copied' ? 'Copied' : 'Copy'}
            </Button>
          </div>
          <p role="status" className="text-sm text-ink-muted">
            {copy === 'failed' && 'Could not copy here: the link is selected, copy it by hand.'}
          </p>
          <p className="rounded-xl bg-warning-soft p-3 font-semibold text-warning">
            Note it now: this link won't be shown again. Anyone with it sees the board (never incidents or people).
          </p>
        </>
      )}
      {screen && !url && (
        // Only a resent add answers without a token: the first attempt made the screen, but its answer never arrived.
        <p>
          {screen.name} was already added by an earlier attempt whose answer did not arrive, so its link was never shown.
          Revoke it and add a new screen.
        </p>
      )}
    </Dialog>
  );
}
