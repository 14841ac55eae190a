import { PhotoIcon } from './action-icons';
import { Button } from './button';
import { Dialog } from './dialog';

interface PhotoThumbLinkProps {
  /** The full photo, opened in a new tab. */
  href: string;
  /** The thumbnail, or null when the server could not make one. */
  thumbSrc: string | null;
  /** What the photo is, e.g. "Photo 2 of the report". */
  name: string;
  contentType: string;
}

/** A photo's thumbnail as a link to the full photo, as repair tickets and incident reports show them. */
export function PhotoThumbLink({ href, thumbSrc, name, contentType }: PhotoThumbLinkProps) {
  return (
    <a href={href} target="_blank" rel="noopener" className="block overflow-hidden rounded-xl border-2 border-line bg-sunken">
      {thumbSrc ? (
        <img src={thumbSrc} alt={name} loading="lazy" className="aspect-[4/3] w-full object-cover" />
      ) : (
        // A HEIC the server could not read: no preview, but the photo itself opens on devices that can show it.
        <span className="flex aspect-[4/3] w-full flex-col items-center justify-center gap-1 p-2 text-center">
          <PhotoIcon className="size-9 text-ink-muted" />
          <span className="font-semibold">{contentType === 'image/heic' || contentType === 'image/heif' ? 'HEIC photo' : 'Photo'}</span>
          <span className="text-sm text-accent-ink underline">Open it</span>
          <span className="sr-only">{name}</span>
        </span>
      )}
    </a>
  );
}

interface RemovePhotoDialogProps {
  open: boolean;
  pending: boolean;
  onKeep: () => void;
  onRemove: () => void;
  /** What removing it means where the photo is, e.g. "It goes from the report for everyone." */
  consequence: string;
}

/** The question before a photo is removed, as repair tickets and incident reports ask it. */
export function RemovePhotoDialog({ open, pending, onKeep, onRemove, consequence }: RemovePhotoDialogProps) {
  return (
    <Dialog
      open={open}
      title="Remove this photo?"
      onClose={onKeep}
      actions={
        <>
          <Button variant="secondary" onClick={onKeep}>
            Keep it
          </Button>
          <Button variant="danger" pending={pending} onClick={onRemove}>
            Remove photo
          </Button>
        </>
      }
    >
      <p>{consequence}</p>
    </Dialog>
  );
}
