import { useState, type ReactNode } from 'react';
import { useNavigate } from 'react-router';
import { changePasswordInput, PASSWORD_MIN, updateAccountInput, type PublicUser } from '@shared/schemas/auth';
import { RoleBadge } from '@/components/badge';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { FormError, FormSuccess } from '@/components/form-error';
import { Page } from '@/components/page';
import { TextField } from '@/components/text-field';
import { errorMessage } from '@/lib/api';
import { useSignOut } from '@/lib/auth';
import { useSchemaForm } from '@/lib/use-schema-form';
import { UNIT_SYSTEM_LABELS } from '@/features/preferences/lib/reader-prefs';
import { changedProfile, useChangePassword, useUpdateAccount } from '../api/account-api';

const unitChoices = [
  { value: 'metric', label: UNIT_SYSTEM_LABELS.metric, example: 'heights in metres, leaves in centimetres' },
  { value: 'imperial', label: UNIT_SYSTEM_LABELS.imperial, example: 'heights in feet, leaves in inches' },
] as const;

function ProfileForm({ user }: { user: PublicUser }) {
  const update = useUpdateAccount();
  const [note, setNote] = useState<string | null>(null);
  const { errors, onSubmit, showServerErrors } = useSchemaForm(updateAccountInput, (data) => {
    const patch = changedProfile(user, data);
    if (Object.keys(patch).length === 0) {
      setNote('Nothing has changed, so there was nothing to save.');
      return;
    }
    setNote(null);
    update.mutate(patch, { onSuccess: () => setNote('Your changes are saved.'), onError: showServerErrors });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5" aria-labelledby="profile-heading">
      <h2 id="profile-heading" className="text-xl">
        Profile
      </h2>
      <TextField label="Display name" name="displayName" defaultValue={user.displayName} autoComplete="nickname" error={errors.displayName} />
      <fieldset>
        <legend className="font-bold">Units for sizes</legend>
        <p className="text-sm text-ink-soft">Used wherever Grovewalk shows heights, spreads and leaf sizes.</p>
        <div className="mt-2 space-y-2">
          {unitChoices.map((choice) => (
            <label key={choice.value} className="flex cursor-pointer items-start gap-3 rounded-md border border-rule bg-paper px-3 py-2">
              <input
                type="radio"
                name="unitSystem"
                value={choice.value}
                defaultChecked={user.unitSystem === choice.value}
                className="mt-1.5 size-4 accent-moss"
              />
              <span>
                <span className="font-bold">{choice.label}</span>
                <span className="block text-sm text-ink-soft">{choice.example}</span>
              </span>
            </label>
          ))}
        </div>
        {errors.unitSystem && <p className="mt-1 text-sm font-bold text-maple">{errors.unitSystem}</p>}
      </fieldset>
      <FormError message={update.isError ? errorMessage(update.error) : null} />
      {note && (
        <p role="status" className="font-bold text-moss">
          {note}
        </p>
      )}
      <Button type="submit" busy={update.isPending}>
        Save changes
      </Button>
    </form>
  );
}

function PasswordForm() {
  const change = useChangePassword();
  const { errors, onSubmit, showServerErrors } = useSchemaForm(changePasswordInput, (data, form) =>
    change.mutate(data, { onSuccess: () => form.reset(), onError: showServerErrors }),
  );

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5" aria-labelledby="password-heading">
      <h2 id="password-heading" className="text-xl">
        Password
      </h2>
      <TextField label="Current password" name="currentPassword" type="password" autoComplete="current-password" error={errors.currentPassword} />
      <TextField
        label="New password"
        name="newPassword"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={errors.newPassword}
      />
      <FormError message={change.isError ? errorMessage(change.error) : null} />
      {change.isSuccess && (
        <FormSuccess>
          <p>Your password is changed.</p>
        </FormSuccess>
      )}
      <Button type="submit" busy={change.isPending}>
        Change password
      </Button>
    </form>
  );
}

function SignOutSection() {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <section aria-labelledby="sign-out-heading" className="space-y-3">
      <h2 id="sign-out-heading" className="text-xl">
        Sign out
      </h2>
      <p className="text-ink-soft">Ends your session in this browser.</p>
      <FormError message={signOut.isError ? errorMessage(signOut.error) : null} />
      <Button variant="secondary" busy={signOut.isPending} onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/') })}>
        Sign out
      </Button>
    </section>
  );
}

/** The signed-in person's own settings: profile, units, password and signing out. */
export function AccountPage({ user, extraSections }: { user: PublicUser; extraSections?: ReactNode }) {
  const since = new Date(user.createdAt);
  return (
    <Page title="Your account" width="medium">
      <dl className="mb-8 grid gap-x-6 gap-y-2 sm:grid-cols-[auto_1fr]">
        <dt className="font-bold">E-mail</dt>
        <dd className="font-ui break-all">{user.email}</dd>
        <dt className="font-bold">Role</dt>
        <dd>
          <RoleBadge role={user.role} />
        </dd>
        <dt className="font-bold">Member since</dt>
        <dd>{Number.isNaN(since.getTime()) ? '—' : since.toLocaleDateString('en-GB', { dateStyle: 'long' })}</dd>
      </dl>
      <div className="space-y-8">
        <Card>
          <ProfileForm user={user} />
        </Card>
        {/* Sections other features add (the route composes them), e.g. "My garden". */}
        {extraSections}
        <Card>
          <PasswordForm />
        </Card>
        <Card>
          <SignOutSection />
        </Card>
      </div>
    </Page>
  );
}
