import { useState } from 'react';
import { REPAIR_PHOTO_MAX_BYTES, REPAIR_PHOTOS_MAX, type RepairDetailJson, type RepairPhotoJson } from '@shared/schemas/repairs';
import { TrashIcon } from '../../../components/ui/action-icons';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PhotoPicker, photoUploadMessage, useAddPhoto } from '../../../components/ui/photo-picker';
import { PhotoThumbLink, RemovePhotoDialog } from '../../../components/ui/photo-thumb';
import { useCan, useViewer } from '../../../lib/authorization';
import { useDeletePhoto } from '../api/delete-photo';
import { useUploadPhoto } from '../api/upload-photo';
import { formatWhen } from './repair-format';

function PhotoTile({ photo, position, title, when, canRemove, onRemove }: {
  photo: RepairPhotoJson;
  position: number;
  title: string;
  when: string;
  canRemove: boolean;
  onRemove: () => void;
}) {
  const name = `Photo ${position} of ‘${title}’`;
  return (
    <li className="flex flex-col gap-1.5">
      <PhotoThumbLink
        href={photo.url}
        thumbSrc={photo.hasThumb ? photo.thumbUrl : null}
        name={photo.hasThumb && photo.thumbUrl ? `${name}, added by ${photo.uploadedBy.displayName}` : name}
        contentType={photo.contentType}
      />
      <div className="flex flex-wrap items-center justify-between gap-x-2">
        <p className="min-w-0 text-sm text-ink-muted">
          {photo.uploadedBy.displayName} · <span className="tabular-nums">{when}</span>
        </p>
        {canRemove && (
          <Button variant="quiet" className="-mr-2" icon={<TrashIcon className="size-5" />} onClick={onRemove}>
            Remove<span className="sr-only"> {name.toLowerCase()}</span>
          </Button>
        )}
      </div>
    </li>
  );
}

/** The ticket's photos (oldest first) as thumbnails that open the full photo; add one from the camera, remove one's own (leads any). */
export function RepairPhotos({ ticket, timeZone, now }: { ticket: RepairDetailJson; timeZone: string; now: Date }) {
  const { user } = useViewer();
  const canWork = useCan('repairs:work');
  const canManage = useCan('repairs:manage');
  const upload = useUploadPhoto(ticket);
  const remove = useDeletePhoto(ticket);
  const [removing, setRemoving] = useState<RepairPhotoJson | null>(null);
  const full = ticket.photos.length >= REPAIR_PHOTOS_MAX;
  const { add, tooBig } = useAddPhoto(upload.mutate, REPAIR_PHOTO_MAX_BYTES);

  return (
    <section aria-labelledby="repair-photos-title" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="repair-photos-title" className="text-2xl font-bold">
          Photos <span className="text-lg font-semibold text-ink-muted tabular-nums">{ticket.photos.length} of {REPAIR_PHOTOS_MAX}</span>
        </h2>
        {canWork && !full && <PhotoPicker label="Add a photo" onPick={add} pending={upload.isPending} />}
      </div>
      {ticket.photos.length === 0 ? (
        <p className="text-ink-muted">No photos yet.</p>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {ticket.photos.map((photo, index) => (
            <PhotoTile
              key={photo.id}
              photo={photo}
              position={index + 1}
              title={ticket.title}
              when={formatWhen(photo.uploadedAt, timeZone, now)}
              canRemove={canManage || (canWork && photo.uploadedBy.id === user.id)}
              onRemove={() => setRemoving(photo)}
            />
          ))}
        </ul>
      )}
      {full && canWork && <p className="text-ink-muted">A ticket holds {REPAIR_PHOTOS_MAX} photos; remove one to add another.</p>}
      {tooBig && <p className="font-semibold text-danger">{tooBig}</p>}
      {upload.isError && <ErrorNotice title="The photo was not added" error={new Error(photoUploadMessage(upload.error) ?? 'Something went wrong.')} />}
      {remove.isError && <ErrorNotice title="The photo was not removed" error={remove.error} />}
      <RemovePhotoDialog
        open={removing !== null}
        pending={remove.isPending}
        onKeep={() => setRemoving(null)}
        onRemove={() => removing && remove.mutate(removing.id, { onSettled: () => setRemoving(null) })}
        consequence="It goes from the ticket for everyone. The history keeps a line saying it was removed."
      />
    </section>
  );
}
