import { useId, useRef, useState, type FormEvent, type ReactNode } from 'react';
import { useNavigate } from 'react-router';
import { cultivarPhotoInput, variantInput, type CultivarFull } from '@shared/schemas/cultivars';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { CultivarPicker, type PickedCultivar } from '@/components/cultivar-picker';
import { FormError, FormSuccess } from '@/components/form-error';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { useReaderPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import {
  useAddVariant,
  useMergeCultivar,
  useRecordStatus,
  useRemovePhoto,
  useRemoveVariant,
  useUpdateCultivar,
  useUpdatePhoto,
  useUploadPhoto,
} from '../api/cultivars-api';
import { RecordForm } from './record-form';

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="rounded-lg border border-rule bg-card p-5 shadow-leaf">
      <h3 className="text-lg">{title}</h3>
      <div className="mt-3">{children}</div>
    </section>
  );
}

function EditPanel({ record }: { record: CultivarFull }) {
  const [open, setOpen] = useState(false);
  const [saved, setSaved] = useState(false);
  const update = useUpdateCultivar(record.id);
  const { prefs } = useReaderPrefs();
  return (
    <Panel title="Edit the record">
      {saved && !open && <FormSuccess>Saved. The page shows the record as it is now.</FormSuccess>}
      {open ? (
        <RecordForm
          initial={record}
          system={prefs.unitSystem}
          submitLabel="Save changes"
          busy={update.isPending}
          error={update.error}
          onCancel={() => {
            update.reset();
            setOpen(false);
          }}
          onSubmit={(input) =>
            update.mutate(input, {
              onSuccess: () => {
                setOpen(false);
                setSaved(true);
              },
            })
          }
        />
      ) : (
        <Button variant="secondary" className="mt-2" onClick={() => { setSaved(false); setOpen(true); }}>
          Edit name, traits and notes
        </Button>
      )}
    </Panel>
  );
}

function StatusPanel({ record }: { record: CultivarFull }) {
  const status = useRecordStatus(record.id);
  const [confirmRetire, setConfirmRetire] = useState(false);
  if (record.mergedInto) return null;
  return (
    <Panel title="Status">
      <p>
        {record.status === 'approved'
          ? 'Approved: listed everywhere, and stops can link to it.'
          : record.status === 'proposed'
            ? 'Waiting for approval: only moderators and the person who proposed it can see it.'
            : 'Retired: kept for old links, but no new stop can link to it.'}
      </p>
      <FormError message={status.error ? errorMessage(status.error) : null} />
      <div className="mt-3 flex flex-wrap gap-3">
        {record.status !== 'approved' && (
          <Button busy={status.isPending && status.variables === 'approve'} onClick={() => status.mutate('approve')}>
            {record.status === 'retired' ? 'Reinstate' : 'Approve'}
          </Button>
        )}
        {record.status === 'approved' && (
          <Button variant="secondary" onClick={() => setConfirmRetire(true)}>
            Retire…
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={confirmRetire}
        title={`Retire ‘${record.epithet}’?`}
        confirmLabel="Retire the record"
        tone="danger"
        busy={status.isPending}
        onCancel={() => setConfirmRetire(false)}
        onConfirm={() => status.mutate('retire', { onSettled: () => setConfirmRetire(false) })}
      >
        <p>It leaves the list of cultivar records, the glossary and search. Stops that link to it keep their link. You can reinstate it later.</p>
      </ConfirmDialog>
    </Panel>
  );
}

function MergePanel({ record }: { record: CultivarFull }) {
  const [target, setTarget] = useState<PickedCultivar | null>(null);
  const [confirm, setConfirm] = useState(false);
  const merge = useMergeCultivar(record.id);
  const navigate = useNavigate();
  if (record.mergedInto) return null;
  const stops = record.tourMoments.length;
  return (
    <Panel title="Merge into another record">
      <p className="text-sm text-ink-soft">For duplicates: the other record stays, this one is retired and its address leads there.</p>
      <div className="mt-3">
        <CultivarPicker label="Record that stays" value={target} onChange={setTarget} exclude={[record.id]} error={isApiError(merge.error) ? merge.error.fields.intoId : undefined} />
      </div>
      <FormError message={merge.error ? errorMessage(merge.error) : null} />
      <Button variant="danger" className="mt-3" disabled={!target} onClick={() => setConfirm(true)}>
        Merge…
      </Button>
      <ConfirmDialog
        open={confirm && target !== null}
        title={`Merge ‘${record.epithet}’ into ‘${target?.epithet ?? ''}’?`}
        confirmLabel="Merge the records"
        tone="danger"
        busy={merge.isPending}
        onCancel={() => setConfirm(false)}
        onConfirm={() =>
          target &&
          merge.mutate(target.id, {
            onSuccess: (result) => navigate(`/cultivars/${result.cultivar.slug}`, { state: { notice: `Merged. ${result.movedStops} stop${result.movedStops === 1 ? "" : "s"} and ${result.movedVariants} variant${result.movedVariants === 1 ? "" : "s"} moved here.` } }),
            onSettled: () => setConfirm(false),
          })
        }
      >
        <ul className="list-disc space-y-1 pl-5">
          <li>
            Every stop that shows ‘{record.epithet}’ {stops ? `(${stops} in published tours)` : ''} moves to {target?.acceptedName}.
          </li>
          <li>Its variants, photos and open spelling fixes move too, and ‘{record.epithet}’ becomes a variant.</li>
          <li>This record is retired. There is no undo; check the choice.</li>
        </ul>
      </ConfirmDialog>
    </Panel>
  );
}

function VariantsPanel({ record }: { record: CultivarFull }) {
  const add = useAddVariant(record.id);
  const remove = useRemoveVariant(record.id);
  const [text, setText] = useState('');
  const [error, setError] = useState<string | undefined>();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const checked = variantInput.safeParse({ text });
    if (!checked.success) {
      setError(checked.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    add.mutate(checked.data.text, { onSuccess: () => setText('') });
  };
  const serverError = isApiError(add.error) ? (add.error.fields.text ?? add.error.message) : add.error ? errorMessage(add.error) : undefined;
  return (
    <Panel title="Name variants (misspellings and mishearings)">
      {record.variants.length ? (
        <ul className="divide-y divide-rule rounded-md border border-rule">
          {record.variants.map((v) => (
            <li key={v.id} className="flex items-center justify-between gap-3 px-3 py-1.5">
              <span>{v.text}</span>
              <Button variant="quiet" size="sm" busy={remove.isPending && remove.variables === v.id} onClick={() => remove.mutate(v.id)} aria-label={`Remove the variant ${v.text}`}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-ink-soft">None recorded.</p>
      )}
      {remove.error != null && <p role="alert" className="mt-2 text-sm font-bold text-maple">{errorMessage(remove.error)}</p>}
      <form onSubmit={submit} className="mt-3 flex flex-wrap items-end gap-3" noValidate>
        <TextField label="Add a name variant" name="text" value={text} onChange={(e) => setText(e.target.value)} error={error ?? serverError} className="min-w-[12rem] flex-1" hint="As it was written or heard, e.g. “Sora no hane”." autoComplete="off" />
        <Button type="submit" variant="secondary" busy={add.isPending}>
          Add
        </Button>
      </form>
    </Panel>
  );
}

function PhotoRow({ record, photo }: { record: CultivarFull; photo: CultivarFull['photos'][number] }) {
  const update = useUpdatePhoto(record.id);
  const remove = useRemovePhoto(record.id);
  const [alt, setAlt] = useState(photo.altText);
  const [confirm, setConfirm] = useState(false);
  const check = cultivarPhotoInput.safeParse({ altText: alt });
  return (
    <li className="flex flex-wrap items-start gap-3 py-3">
      <img src={photo.thumbUrl} alt="" className="h-20 w-28 rounded border border-rule object-cover" />
      <form
        className="flex min-w-[14rem] flex-1 flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (check.success) update.mutate({ photoId: photo.id, altText: check.data.altText });
        }}
      >
        <TextField label="Description (alt text)" name="altText" value={alt} onChange={(e) => setAlt(e.target.value)} error={!check.success ? check.error.issues[0]?.message : update.error ? errorMessage(update.error) : undefined} className="flex-1" />
        <Button type="submit" variant="secondary" size="sm" busy={update.isPending} disabled={alt === photo.altText}>
          Save
        </Button>
        <Button variant="quiet" size="sm" onClick={() => setConfirm(true)}>
          Remove
        </Button>
      </form>
      <ConfirmDialog open={confirm} title="Remove this photo?" confirmLabel="Remove the photo" tone="danger" busy={remove.isPending} onCancel={() => setConfirm(false)} onConfirm={() => remove.mutate(photo.id, { onSettled: () => setConfirm(false) })}>
        <p>“{photo.altText}” is deleted from the record.</p>
        {remove.error != null && <p className="mt-2 font-bold text-maple">{errorMessage(remove.error)}</p>}
      </ConfirmDialog>
    </li>
  );
}

function PhotosPanel({ record }: { record: CultivarFull }) {
  const upload = useUploadPhoto(record.id);
  const id = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [done, setDone] = useState(false);

  const submit = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    setDone(false);
    const form = e.currentTarget;
    const file = fileRef.current?.files?.[0];
    const alt = cultivarPhotoInput.safeParse({ altText: String(new FormData(form).get('altText') ?? '') });
    const errs: Record<string, string> = {};
    if (!file) errs.photo = 'Choose a photo (JPEG, PNG or WebP).';
    if (!alt.success) errs.altText = alt.error.issues[0]?.message ?? 'Describe the photo.';
    setErrors(errs);
    if (!file || !alt.success) return;
    upload.mutate(
      { file, altText: alt.data.altText },
      {
        onSuccess: () => {
          form.reset();
          setDone(true);
        },
      },
    );
  };
  const serverFields = isApiError(upload.error) ? upload.error.fields : {};

  return (
    <Panel title="Photos">
      {record.photos.length > 0 && (
        <ul className="divide-y divide-rule">
          {record.photos.map((p) => (
            <PhotoRow key={p.id} record={record} photo={p} />
          ))}
        </ul>
      )}
      <form onSubmit={submit} noValidate className="mt-3 space-y-3 border-t border-rule pt-3">
        {done && <FormSuccess>Photo added.</FormSuccess>}
        <FormError message={upload.error ? errorMessage(upload.error) : null} />
        <div>
          <label htmlFor={`${id}-file`} className="block font-bold">
            Photo
          </label>
          <p id={`${id}-file-hint`} className="text-sm text-ink-soft">
            JPEG, PNG or WebP, up to 15 MB; large photos are made smaller.
          </p>
          <input ref={fileRef} id={`${id}-file`} name="photo" type="file" accept="image/jpeg,image/png,image/webp" aria-describedby={`${id}-file-hint`} aria-invalid={errors.photo ? true : undefined} className="mt-1 block w-full text-sm" />
          {(errors.photo ?? serverFields.photo) && <p className="mt-1 text-sm font-bold text-maple">{errors.photo ?? serverFields.photo}</p>}
        </div>
        <TextField label="Description (alt text)" name="altText" hint="What the photo shows, for people who cannot see it: e.g. “Lace leaves turning scarlet in late October”." error={errors.altText ?? serverFields.altText} />
        <Button type="submit" variant="secondary" busy={upload.isPending}>
          Add the photo
        </Button>
      </form>
    </Panel>
  );
}

/**
 * Everything a moderator can do to a record (edit, approve or retire, merge, variants, photos);
 * the proposer of a record still waiting for approval gets only the photos.
 */
export function ModeratorTools({ record, moderator }: { record: CultivarFull; moderator: boolean }) {
  if (!moderator) return <PhotosPanel record={record} />;
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <div className="space-y-6">
        <StatusPanel record={record} />
        <VariantsPanel record={record} />
        <MergePanel record={record} />
      </div>
      <div className="space-y-6">
        <PhotosPanel record={record} />
      </div>
      <div className="lg:col-span-2">
        <EditPanel record={record} />
      </div>
    </div>
  );
}
