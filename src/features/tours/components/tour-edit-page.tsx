import { useState, type FormEvent } from 'react';
import { Link, useLocation, useNavigate } from 'react-router';
import { updateTourInput, type TourDto } from '@shared/schemas/tours';
import { Button, buttonClasses } from '@/components/button';
import { Card } from '@/components/card';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { FormError, FormSuccess } from '@/components/form-error';
import { Page, useDocumentTitle } from '@/components/page';
import { RichTextField } from '@/components/rich-text-field';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { checkForm, focusFirstError, formValues, type FieldErrors } from '@/lib/form';
import { isBusy, useDeleteTour, useRememberTour, useSetPublished, useTour, useTourJob, useUpdateTour } from '../api/tours-api';
import { uploadReplacementVideo } from '../api/upload-api';
import { useVideoUpload } from '../hooks/use-video-upload';
import { changedDetails, detailsInputFrom } from '../lib/details';
import { formatDay } from '../lib/media-format';
import { TourLoadState } from './tour-load-state';
import { TourStateBadge } from './tour-state-badge';
import { TranscodePanel } from './transcode-panel';
import { UploadStatus } from './upload-status';
import { VideoPicker } from './video-picker';


function DetailsForm({ tour }: { tour: TourDto }) {
  const update = useUpdateTour(tour.id);
  const [description, setDescription] = useState(tour.descriptionHtml);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [note, setNote] = useState<string | null>(null);

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = event.currentTarget;
    const v = formValues(form);
    const checked = checkForm(updateTourInput, detailsInputFrom({ title: v.title ?? '', garden: v.garden ?? '', filmedOn: v.filmedOn ?? '', descriptionHtml: description }));
    if (!checked.ok) {
      setErrors(checked.errors);
      setNote(null);
      focusFirstError(form, checked.errors);
      return;
    }
    setErrors({});
    const patch = changedDetails(tour, checked.data);
    if (Object.keys(patch).length === 0) {
      setNote('Nothing has changed, so there was nothing to save.');
      return;
    }
    setNote(null);
    update.mutate(patch, {
      onSuccess: () => setNote('Details saved.'),
      onError: (error) => {
        if (isApiError(error) && Object.keys(error.fields).length > 0) setErrors({ ...error.fields });
      },
    });
  };

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5" aria-labelledby="details-heading">
      <h2 id="details-heading" className="text-xl">
        Details
      </h2>
      <TextField label="Title" name="title" defaultValue={tour.title} maxLength={160} required error={errors.title} />
      <TextField
        label="Garden or place"
        name="garden"
        defaultValue={tour.garden}
        maxLength={160}
        hint="Where the walk was filmed, as you would like viewers to see it."
        error={errors.garden}
      />
      <TextField label="Date filmed" name="filmedOn" type="date" defaultValue={tour.filmedOn ?? ''} error={errors.filmedOn} className="max-w-xs" />
      <RichTextField
        label="Description"
        hint="What the walk shows, the season, anything viewers should look out for. Bold, italic, lists and links are kept."
        error={errors.descriptionHtml}
        initialHtml={tour.descriptionHtml}
        onChange={setDescription}
      />
      <FormError message={update.isError ? errorMessage(update.error) : null} />
      {note && (
        <p role="status" className="font-bold text-moss">
          {note}
        </p>
      )}
      <Button type="submit" busy={update.isPending}>
        Save details
      </Button>
    </form>
  );
}

function PublishPanel({ tour }: { tour: TourDto }) {
  const publish = useSetPublished(tour.id);
  const busy = isBusy(tour.state, tour.job);
  let text: string;
  if (tour.state === 'published') {
    const on = formatDay(tour.publishedAt?.slice(0, 10));
    text = `Published${on ? ` on ${on}` : ''}. Everyone can find and watch it.`;
  } else if (tour.state === 'ready') text = 'Ready to publish. Until you do, only you, moderators and admins can see it.';
  else if (busy) text = 'You can publish once the video is ready.';
  else text = 'Publishing needs a playable video. Try again or upload the video once more.';

  return (
    <section aria-labelledby="publish-heading" className="rounded-lg border border-rule bg-card p-5 shadow-leaf">
      <h2 id="publish-heading" className="text-lg">
        Publishing
      </h2>
      <p className="mt-1">{text}</p>
      <div className="mt-4 flex flex-wrap gap-3">
        {tour.state === 'published' ? (
          <>
            <Link to={`/tours/${tour.id}`} className={buttonClasses('primary')}>
              Watch
            </Link>
            <Button variant="secondary" busy={publish.isPending} onClick={() => publish.mutate(false)}>
              Unpublish
            </Button>
          </>
        ) : (
          <>
            <Button busy={publish.isPending} disabled={tour.state !== 'ready'} onClick={() => publish.mutate(true)}>
              Publish tour
            </Button>
            {tour.renditions.length > 0 && (
              <Link to={`/tours/${tour.id}`} className={buttonClasses('secondary')}>
                Preview
              </Link>
            )}
          </>
        )}
      </div>
      <div className="mt-3">
        <FormError message={publish.isError ? errorMessage(publish.error) : null} />
      </div>
    </section>
  );
}

function ReplaceVideo({ tour }: { tour: TourDto }) {
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<string | undefined>();
  const upload = useVideoUpload();
  const remember = useRememberTour();
  const playable = tour.renditions.length > 0;

  const start = async () => {
    if (!file) return setError('Choose the new video file first.');
    if (file.size === 0) return setError('This file is empty. Choose the video file itself.');
    setError(undefined);
    const updated = await upload.start(file, (f, opts) => uploadReplacementVideo(tour.id, f, opts));
    if (updated) {
      remember(updated);
      setFile(null);
    }
  };

  return (
    <section aria-labelledby="replace-heading" className="rounded-lg border border-rule bg-card p-5 shadow-leaf">
      <h2 id="replace-heading" className="text-lg">
        Replace the video
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        The new file is prepared the same way.{playable ? ' Viewers see the current video until the new one is ready.' : ''}
      </p>
      <div className="mt-4 space-y-4">
        <VideoPicker
          label="New video file"
          file={file}
          disabled={upload.busy}
          error={error}
          onFile={(f) => {
            setFile(f);
            setError(undefined);
            upload.reset();
          }}
        />
        <UploadStatus state={upload.state} onCancel={upload.cancel} fileName={file?.name} />
        {upload.state.phase === 'done' && (
          <FormSuccess>
            <p>New video uploaded. It is being prepared now.</p>
          </FormSuccess>
        )}
        <Button variant="secondary" busy={upload.busy} onClick={() => void start()}>
          Upload new video
        </Button>
      </div>
    </section>
  );
}

function DeletePanel({ tour }: { tour: TourDto }) {
  const [open, setOpen] = useState(false);
  const remove = useDeleteTour();
  const navigate = useNavigate();
  return (
    <section aria-labelledby="delete-heading" className="rounded-lg border border-maple/40 bg-card p-5">
      <h2 id="delete-heading" className="text-lg text-maple">
        Delete this tour
      </h2>
      <p className="mt-1 text-sm">Deletes the tour, its details and every video file made from it.</p>
      <Button variant="danger" className="mt-4" onClick={() => setOpen(true)}>
        Delete tour…
      </Button>
      <ConfirmDialog
        open={open}
        title="Delete this tour?"
        confirmLabel="Delete tour"
        tone="danger"
        busy={remove.isPending}
        onCancel={() => {
          remove.reset();
          setOpen(false);
        }}
        onConfirm={() =>
          remove.mutate(tour.id, {
            onSuccess: () => {
              setOpen(false);
              navigate('/my/tours', { state: { deleted: tour.title } });
            },
          })
        }
      >
        <p>
          “{tour.title}” and all its video files will be removed for good. Captions and stops added later go with it. This cannot be
          undone.
        </p>
        {remove.isError && <p className="mt-3 font-bold text-maple">{errorMessage(remove.error)}</p>}
      </ConfirmDialog>
    </section>
  );
}

function EditView({ tour }: { tour: TourDto }) {
  const location = useLocation();
  const justUploaded = (location.state as { justUploaded?: boolean } | null)?.justUploaded === true;
  useDocumentTitle(`Edit “${tour.title}”`);
  return (
    <div className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6 sm:py-12">
      <p className="font-ui text-sm">
        <Link to="/my/tours">
          <span aria-hidden="true">← </span>My tours
        </Link>
      </p>
      <div className="mt-1 flex flex-wrap items-center gap-x-4 gap-y-2">
        <h1 className="text-3xl text-moss-deep sm:text-4xl">Edit tour</h1>
        <TourStateBadge state={tour.state} job={tour.job} />
      </div>
      <p className="mt-2 text-lg text-ink-soft">{tour.title}</p>
      {justUploaded && isBusy(tour.state, tour.job) && (
        <div className="mt-6">
          <FormSuccess>
            <p>Upload complete. The video is being prepared; meanwhile you can fill in the details below.</p>
          </FormSuccess>
        </div>
      )}
      <div className="mt-8 grid items-start gap-x-8 gap-y-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6 lg:col-start-2 lg:row-start-1">
          <TranscodePanel tour={tour} />
          <PublishPanel tour={tour} />
          <Link to={`/tours/${tour.id}/captions`} className={buttonClasses('secondary', 'md', 'w-full')}>
            Captions and stops
          </Link>
        </div>
        <div className="space-y-6 lg:col-start-1 lg:row-span-2 lg:row-start-1">
          <Card>
            <DetailsForm key={tour.id} tour={tour} />
          </Card>
        </div>
        <div className="space-y-6 lg:col-start-2">
          <ReplaceVideo tour={tour} />
          <DeletePanel tour={tour} />
        </div>
      </div>
    </div>
  );
}

/**
 * The author's page for one tour: details with the description editor, the video's preparation
 * (polled while it runs), publishing, replacing the video and deleting the tour.
 */
export function TourEditPage({ tourId }: { tourId: number }) {
  const tour = useTour(tourId);
  const data = tour.data;
  useTourJob(tourId, Boolean(data?.canEdit && isBusy(data.state, data.job)));

  if (!tour.isSuccess) return <TourLoadState query={tour} width="max-w-6xl" />;
  if (!tour.data.canEdit) {
    return (
      <Page title="You cannot edit this tour" width="medium">
        <p>Only the tour&apos;s author, moderators and admins can change it.</p>
        <Link to={`/tours/${tourId}`} className={buttonClasses('secondary', 'md', 'mt-6')}>
          Go to the tour
        </Link>
      </Page>
    );
  }
  return <EditView tour={tour.data} />;
}
