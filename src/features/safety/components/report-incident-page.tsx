import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { INCIDENT_PHOTO_MAX_BYTES, INCIDENT_PHOTOS_MAX } from '@shared/schemas/incidents';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PageHeader } from '../../../components/ui/page-header';
import { PhotoPicker, PickedPhoto, photoProblem, photoUploadMessage } from '../../../components/ui/photo-picker';
import { isApiError } from '../../../lib/api-client';
import { useFocusFirstInvalid } from '../../../lib/focus-invalid';
import type { FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { serverNow } from '../../../lib/server-clock';
import { useCreateIncident } from '../api/create-incident';
import { useUploadIncidentPhoto } from '../api/incident-photos';
import { ClassificationPreview } from './classification';
import type { IncidentBattery } from './report-choices';
import { areaClass, ReportFields } from './report-fields';
import { emptyReport, readReport, reportErrorsOf, type ReportValues } from './report-form-values';

interface ReportIncidentPageProps {
  /** The current event (the report belongs to it), or null outside an event. */
  eventId: string | null;
  /** Whose clock the time is read on: the event's, else this tablet's. */
  timeZone: string;
  /** The team's batteries in service, to name one in a battery incident. */
  batteries: IncidentBattery[] | undefined;
}

/**
 * "Report an incident", for anyone signed in: tap where and what, say what happened, who was
 * involved (initials only) and what care was given; the class and who will be told show as the
 * ticks change. The report's id is made here and kept through retries, so a resend after a lost
 * answer makes no second report. Photos go up once the report exists.
 */
export function ReportIncidentPage({ eventId, timeZone, batteries }: ReportIncidentPageProps) {
  const navigate = useNavigate();
  const [id] = useState(newId);
  const create = useCreateIncident();
  const upload = useUploadIncidentPhoto(id);
  const [values, setValues] = useState<ReportValues>(() => emptyReport(serverNow(), timeZone));
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [photos, setPhotos] = useState<File[]>([]);
  const [photoError, setPhotoError] = useState<string | null>(null);
  const created = create.isSuccess;
  const errors = reportErrorsOf(clientErrors, create.error);
  const form = useFocusFirstInvalid(clientErrors, create.error);
  const set = <K extends keyof ReportValues>(field: K) => (value: ReportValues[K]) => setValues((old) => ({ ...old, [field]: value }));
  const openReport = () => navigate(`/safety/incidents/${id}`);

  // One at a time, each dropped from the list once it is up: a retry sends only what is left.
  async function sendPhotos(files: File[]) {
    for (const file of files) {
      await upload.mutateAsync(file);
      setPhotos((left) => left.filter((other) => other !== file));
    }
    await openReport();
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readReport(values, id, timeZone);
    setClientErrors(read.ok ? {} : read.errors);
    if (!read.ok) return;
    // A failed photo shows from the upload's own state, with a retry: nothing to do with it here.
    create.mutate({ ...read.data, ...(eventId ? { eventId } : {}) }, { onSuccess: () => void sendPhotos(photos).catch(() => undefined) });
  }

  function pick(file: File) {
    const problem = photoProblem(file, INCIDENT_PHOTO_MAX_BYTES);
    setPhotoError(problem);
    if (!problem) setPhotos((old) => [...old, file]);
  }

  const uploadMessage = photoUploadMessage(upload.error);
  const saveProblem = create.error && !(isApiError(create.error, 'invalid') && Object.keys(errors).length > 0) ? create.error : null;
  const invalid = Object.keys(errors).length > 0;

  return (
    <>
      <PageHeader title="Report an incident" description="Anyone can report. Say what you know now; the safety captain follows it up." />
      <form ref={form} noValidate onSubmit={submit} className="flex max-w-3xl flex-col gap-6">
        <ReportFields values={values} onChange={set} errors={errors} batteries={batteries} timeHint="Now, unless you change it." />
        <div className={areaClass}>
          <p className="font-semibold">Photos (optional)</p>
          {photos.map((file, index) => (
            <PickedPhoto key={`${index}-${file.name}`} file={file} onRemove={() => setPhotos((old) => old.filter((other) => other !== file))} />
          ))}
          {photos.length < INCIDENT_PHOTOS_MAX && !created && <PhotoPicker label={photos.length ? 'Take another photo' : 'Take a photo'} onPick={pick} />}
          {photoError && <p className="font-semibold text-danger">{photoError}</p>}
        </div>
        <ClassificationPreview kind={values.kind} treatments={values.treatments} />
        {invalid && !saveProblem && <p className="font-semibold text-danger">Some answers need a look: see the messages above.</p>}
        {saveProblem && <ErrorNotice title="Not sent yet" error={saveProblem} />}
        {created && upload.isError && (
          <div role="alert" className="flex flex-col gap-3 rounded-xl border-2 border-warning bg-warning-soft p-4">
            <p className="font-bold">The report is sent, but {photos.length === 1 ? 'a photo was' : `${photos.length} photos were`} not added.</p>
            <p>{uploadMessage}</p>
            <div className="flex flex-wrap gap-3">
              <Button variant="secondary" onClick={() => void sendPhotos(photos).catch(() => undefined)} pending={upload.isPending}>
                Try the photos again
              </Button>
              <Button variant="quiet" onClick={openReport}>
                Open the report without them
              </Button>
            </div>
          </div>
        )}
        <div className="flex flex-wrap gap-3">
          <Button type="submit" size="lg" pending={create.isPending || upload.isPending} disabled={created} className="grow sm:grow-0">
            {upload.isPending ? 'Adding the photos' : 'Send the report'}
          </Button>
          <LinkButton to="/safety" variant="secondary" size="lg">
            Cancel
          </LinkButton>
        </div>
      </form>
    </>
  );
}
