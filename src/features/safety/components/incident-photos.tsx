import { useState } from 'react';
import { INCIDENT_PHOTO_MAX_BYTES, INCIDENT_PHOTOS_MAX, type IncidentJson, type IncidentPhotoJson } from '@shared/schemas/incidents';
import { TrashIcon } from '../../../components/ui/action-icons';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PhotoPicker, photoUploadMessage, useAddPhoto } from '../../../components/ui/photo-picker';
import { PhotoThumbLink, RemovePhotoDialog } from '../../../components/ui/photo-thumb';
import { useCan } from '../../../lib/authorization';
import { incidentPhotoUrl } from '../api/get-incident';
import { useDeleteIncidentPhoto, useUploadIncidentPhoto } from '../api/incident-photos';

function PhotoTile({ incidentId, photo, position, onRemove }: { incidentId: string; photo: IncidentPhotoJson; position: number; onRemove?: () => void }) {
  const name = `Photo ${position} of the report`;
  return (
    <li className="flex flex-col gap-1.5">
      <PhotoThumbLink
        href={incidentPhotoUrl(incidentId, photo.id, 'full')}
        thumbSrc={photo.hasThumb ? incidentPhotoUrl(incidentId, photo.id, 'thumb') : null}
        name={name}
        contentType={photo.contentType}
      />
      {onRemove && (
        <Button variant="quiet" className="-ml-4 self-start" icon={<TrashIcon className="size-5" />} onClick={onRemove}>
          Remove<span className="sr-only"> {name.toLowerCase()}</span>
        </Button>
      )}
    </li>
  );
}

/** The report's photos; its reporter and the safety captains add them from the camera, the captains remove them. */
export function IncidentPhotos({ incident }: { incident: IncidentJson }) {
  const canManage = useCan('incidents:manage');
  const upload = useUploadIncidentPhoto(incident.id);
  const remove = useDeleteIncidentPhoto(incident.id);
  const [removing, setRemoving] = useState<IncidentPhotoJson | null>(null);
  const full = incident.photos.length >= INCIDENT_PHOTOS_MAX;
  const { add, tooBig } = useAddPhoto(upload.mutate, INCIDENT_PHOTO_MAX_BYTES);

  return (
    <section aria-labelledby="incident-photos-title" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="incident-photos-title" className="text-2xl font-bold">
          Photos <span className="text-lg font-semibold text-ink-muted tabular-nums">{incident.photos.length} of {INCIDENT_PHOTOS_MAX}</span>
        </h2>
        {!full && <PhotoPicker label="Add a photo" onPick={add} pending={upload.isPending} />}
      </div>
      {incident.photos.length === 0 ? (
        <p className="text-ink-muted">No photos.</p>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {incident.photos.map((photo, index) => (
            <PhotoTile key={photo.id} incidentId={incident.id} photo={photo} position={index + 1} onRemove={canManage ? () => setRemoving(photo) : undefined} />
          ))}
        </ul>
      )}
      {tooBig && <p className="font-semibold text-danger">{tooBig}</p>}
      {upload.isError && <ErrorNotice title="The photo was not added" error={new Error(photoUploadMessage(upload.error) ?? 'Something went wrong.')} />}
      {remove.isError && <ErrorNotice title="The photo was not removed" error={remove.error} />}
      <RemovePhotoDialog
        open={removing !== null}
        pending={remove.isPending}
        onKeep={() => setRemoving(null)}
        onRemove={() => removing && remove.mutate(removing.id, { onSettled: () => setRemoving(null) })}
        consequence="It goes from the report for everyone."
      />
    </section>
  );
}
