import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { tourDetailsInput } from '@shared/schemas/tours';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { Page } from '@/components/page';
import { TextField } from '@/components/text-field';
import { checkForm, focusFirstError, formValues, type FieldErrors } from '@/lib/form';
import { useRememberTour } from '../api/tours-api';
import { uploadNewTour } from '../api/upload-api';
import { useVideoUpload } from '../hooks/use-video-upload';
import { UploadStatus } from './upload-status';
import { VideoPicker } from './video-picker';

const optionalDetails = tourDetailsInput.pick({ title: true, garden: true, filmedOn: true }).partial();

/** Form values with the empty ones left out, since every detail is optional at upload time. */
function filledIn(values: Record<string, string>): Record<string, string> {
  return Object.fromEntries(Object.entries(values).filter(([key, v]) => key !== 'video' && v.trim() !== ''));
}

/**
 * Upload a new tour: choose or drop a file, optionally name it, and watch it go up with a
 * progress bar and a Cancel button. Once the server has accepted it, the author lands on the
 * tour's edit page, where the transcoding progress is shown.
 */
export function NewTourPage() {
  const navigate = useNavigate();
  const remember = useRememberTour();
  const [file, setFile] = useState<File | null>(null);
  const [errors, setErrors] = useState<FieldErrors>({});
  const upload = useVideoUpload();

  const onSubmit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (upload.busy) return;
    const form = event.currentTarget;
    const values = filledIn(formValues(form));
    const checked = checkForm(optionalDetails, values);
    const next: FieldErrors = checked.ok ? {} : { ...checked.errors };
    if (!file) next.video = 'Choose a video file to upload.';
    else if (file.size === 0) next.video = 'This file is empty. Choose the video file itself.';
    setErrors(next);
    if (Object.keys(next).length > 0 || !checked.ok) {
      if (next.video) form.querySelector<HTMLInputElement>('input[type="file"]')?.focus();
      else focusFirstError(form, next);
      return;
    }
    const tour = await upload.start(file!, (f, opts) => uploadNewTour(f, values, opts));
    if (tour) {
      remember(tour);
      navigate(`/tours/${tour.id}/edit`, { state: { justUploaded: true } });
    }
  };

  return (
    <Page
      title="Upload a tour"
      width="medium"
      intro="Choose the video of your garden walk. Title, place and date are optional now; you can add them, and a description, while the video is being prepared."
    >
      <Card>
        <form noValidate onSubmit={onSubmit} className="space-y-6">
          <VideoPicker
            file={file}
            disabled={upload.busy}
            error={errors.video}
            onFile={(f) => {
              setFile(f);
              setErrors(({ video: _drop, ...rest }) => rest);
              upload.reset();
            }}
          />
          <fieldset className="space-y-5" disabled={upload.busy}>
            <legend className="text-lg font-bold">Details (optional)</legend>
            <TextField label="Title" name="title" maxLength={160} hint="Leave empty to use the file name for now." error={errors.title} />
            <TextField label="Garden or place" name="garden" maxLength={160} error={errors.garden} />
            <TextField label="Date filmed" name="filmedOn" type="date" error={errors.filmedOn} className="max-w-xs" />
          </fieldset>
          <UploadStatus state={upload.state} onCancel={upload.cancel} fileName={file?.name} />
          <div className="flex flex-wrap items-center gap-4">
            <Button type="submit" busy={upload.busy}>
              Upload tour
            </Button>
            <Link to="/my/tours">Back to My tours</Link>
          </div>
        </form>
      </Card>
    </Page>
  );
}

/** Shown instead of the upload form to people who are signed in but are not authors. */
export function UploadNotAllowed() {
  return (
    <Page title="Uploading is for authors" width="medium">
      <p>
        Tours are uploaded by the club&apos;s authors. If you film your garden and would like to share walks here, ask an admin of
        your club to make your account an author account.
      </p>
      <p className="mt-4">
        Meanwhile, you can <Link to="/tours">watch the published tours</Link>.
      </p>
    </Page>
  );
}
