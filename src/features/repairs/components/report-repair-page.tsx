import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { REPAIR_DESCRIPTION_MAX, REPAIR_PHOTO_MAX_BYTES, REPAIR_TITLE_MAX } from '@shared/schemas/repairs';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass, Field, TextField } from '../../../components/ui/field';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { PhotoPicker, PickedPhoto, photoProblem, photoUploadMessage } from '../../../components/ui/photo-picker';
import { isApiError } from '../../../lib/api-client';
import type { FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { useCreateRepair } from '../api/create-repair';
import { useSubsystems } from '../api/get-subsystems';
import { useUploadPhoto } from '../api/upload-photo';
import type { RepairAssignee, RepairMatch } from './repair-context';
import { AssigneeSelect, FoundInSelect, MinutesField, SeverityChoices, SubsystemChoices } from './repair-fields';
import { emptyReport, fieldErrorsOf, readReport, type ReportValues } from './repair-form-values';

interface ReportRepairPageProps {
  eventId: string;
  /** The event's matches (from the schedule). */
  matches: RepairMatch[];
  /** Our match played last, else our next one: where a problem is most likely found. */
  defaultMatchId: string | null;
  /** Members who work on repairs; undefined while they load. */
  assignees: RepairAssignee[] | undefined;
}

/**
 * "Report a problem", quick enough to fill in at the robot: what is wrong, where, how bad, then
 * whatever else is known. A photo from the camera goes up once the ticket exists. The ticket's id
 * is made here and kept through retries, so a resend after a lost answer makes no second ticket.
 */
export function ReportRepairPage({ eventId, matches, defaultMatchId, assignees }: ReportRepairPageProps) {
  const navigate = useNavigate();
  const [id] = useState(newId);
  const create = useCreateRepair(eventId);
  const upload = useUploadPhoto({ id, eventId });
  const subsystems = useSubsystems();
  const [values, setValues] = useState<ReportValues>(() => emptyReport(defaultMatchId));
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [photo, setPhoto] = useState<File | null>(null);
  const [photoError, setPhotoError] = useState<string | null>(null);
  const created = create.isSuccess;
  const errors = fieldErrorsOf(clientErrors, create.error);
  const set = <K extends keyof ReportValues>(field: K) => (value: ReportValues[K]) => setValues((old) => ({ ...old, [field]: value }));
  const backToBoard = () => navigate('/repairs');

  function sendPhoto(file: File) {
    upload.mutate(file, { onSuccess: backToBoard });
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readReport(values, id);
    setClientErrors(read.ok ? {} : read.errors);
    if (!read.ok) return;
    create.mutate(read.data, { onSuccess: () => (photo ? sendPhoto(photo) : backToBoard()) });
  }

  function pick(file: File) {
    const problem = photoProblem(file, REPAIR_PHOTO_MAX_BYTES);
    setPhotoError(problem);
    setPhoto(problem ? null : file);
  }

  function retakePhoto(file: File) {
    pick(file);
    if (!photoProblem(file, REPAIR_PHOTO_MAX_BYTES)) sendPhoto(file);
  }

  const uploadMessage = photoUploadMessage(upload.error);
  const saveProblem = create.error && !(isApiError(create.error, 'invalid') && Object.keys(errors).length > 0) ? create.error : null;

  return (
    <>
      <PageHeader title="Report a problem" description="What broke, where, and how bad. The rest can be filled in later." />
      <form noValidate onSubmit={submit} className="flex max-w-3xl flex-col gap-6 sm:rounded-2xl sm:border sm:border-line sm:bg-surface sm:p-6 sm:shadow-sm">
        <TextField
          label="What is wrong?"
          placeholder="e.g. Arm chain off the sprocket"
          maxLength={REPAIR_TITLE_MAX}
          autoComplete="off"
          value={values.title}
          onChange={(event) => set('title')(event.target.value)}
          error={errors.title}
        />
        {subsystems.isPending && <Loading label="Loading the subsystems" />}
        {subsystems.isError && <ErrorNotice title="Could not load the subsystems" error={subsystems.error} onRetry={() => subsystems.refetch()} retrying={subsystems.isFetching} />}
        {subsystems.isSuccess && <SubsystemChoices subsystems={subsystems.data.subsystems} value={values.subsystem} onChange={set('subsystem')} error={errors.subsystem} />}
        <SeverityChoices value={values.severity} onChange={set('severity')} error={errors.severity} />
        <div className="flex flex-col gap-2">
          <p className="font-semibold">Photo (optional)</p>
          {photo ? <PickedPhoto file={photo} onRemove={() => setPhoto(null)} /> : <PhotoPicker label="Take a photo" onPick={pick} disabled={created} />}
          {photoError && <p className="font-semibold text-danger">{photoError}</p>}
        </div>
        <div className="grid gap-5 sm:grid-cols-2">
          <FoundInSelect matches={matches} value={values.foundInMatchId} onChange={set('foundInMatchId')} error={errors.foundInMatchId} />
          <AssigneeSelect assignees={assignees} value={values.assigneeId} onChange={set('assigneeId')} error={errors.assigneeId} />
          <MinutesField
            label="Estimate in minutes (optional)"
            value={values.estimate}
            onChange={set('estimate')}
            error={errors.estimateMinutes}
            hint="How long the fix will take. The board says whether it makes the queue call."
          />
        </div>
        <Field label="More detail (optional)" error={errors.description}>
          {(control) => (
            <textarea
              rows={3}
              maxLength={REPAIR_DESCRIPTION_MAX}
              className={controlClass}
              value={values.description}
              onChange={(event) => set('description')(event.target.value)}
              {...control}
            />
          )}
        </Field>
        {saveProblem && <ErrorNotice title="Not reported yet" error={saveProblem} />}
        {created && upload.isError && (
          <div role="alert" className="flex flex-col gap-3 rounded-xl border-2 border-warning bg-warning-soft p-4">
            <p className="font-bold">The problem is reported, but the photo was not added.</p>
            <p>{uploadMessage}</p>
            <div className="flex flex-wrap gap-3">
              {photo && (
                <Button variant="secondary" onClick={() => sendPhoto(photo)} pending={upload.isPending}>
                  Try the photo again
                </Button>
              )}
              <PhotoPicker label="Take another photo" onPick={retakePhoto} pending={upload.isPending} />
              <LinkButton to={`/repairs/${id}`} variant="quiet">
                Open the ticket without it
              </LinkButton>
            </div>
          </div>
        )}
        <div className="flex flex-wrap gap-3">
          <Button type="submit" size="lg" pending={create.isPending || upload.isPending} disabled={created} className="grow sm:grow-0">
            {upload.isPending ? 'Adding the photo' : 'Report the problem'}
          </Button>
          <LinkButton to="/repairs" variant="secondary" size="lg">
            Cancel
          </LinkButton>
        </div>
      </form>
    </>
  );
}
