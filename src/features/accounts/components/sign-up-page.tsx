import { useState } from 'react';
import { Link } from 'react-router';
import { PASSWORD_MIN, signUpInput } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { FormError } from '@/components/form-error';
import { Page } from '@/components/page';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useBrowserAccountPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import { UNIT_SYSTEM_LABELS } from '@/features/preferences/lib/reader-prefs';
import { useSignUp } from '../api/account-api';
import { ResendLinkButton } from './resend-link';

/** Creating an account: the account stays unconfirmed until the link in the e-mail is opened. */
export function SignUpForm({ onDone }: { onDone: (email: string) => void }) {
  const signUp = useSignUp();
  const carried = useBrowserAccountPrefs();
  const { errors, onSubmit, showServerErrors } = useSchemaForm(signUpInput, (data) =>
    signUp.mutate({ ...data, ...carried }, { onSuccess: () => onDone(data.email), onError: showServerErrors }),
  );
  const taken = isApiError(signUp.error, 'email_taken');
  // Worth saying only when they differ from what a new account starts with.
  const carriedText = [carried.unitSystem === 'imperial' ? UNIT_SYSTEM_LABELS.imperial.toLowerCase() : null, carried.hardinessZone ? `zone ${carried.hardinessZone}` : null]
    .filter(Boolean)
    .join(', ');

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5">
      <TextField
        label="Display name"
        name="displayName"
        autoComplete="nickname"
        hint="Shown to others beside your tours and the names you flag. 2 to 60 characters."
        error={errors.displayName}
      />
      <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters. A few unrelated words make a strong one.`}
        error={errors.password}
      />
      {carriedText && <p className="text-sm text-ink-soft">Your new account starts with the settings chosen on this browser: {carriedText}.</p>}
      <FormError message={signUp.isError ? errorMessage(signUp.error) : null}>
        {taken && (
          <p>
            <Link to="/sign-in">Sign in</Link> or <Link to="/forgot-password">choose a new password</Link>.
          </p>
        )}
      </FormError>
      <Button type="submit" busy={signUp.isPending} className="w-full sm:w-auto">
        Create account
      </Button>
    </form>
  );
}

/** The sign-up page; after sending, it tells the person to look for the confirmation e-mail. */
export function SignUpPage() {
  const [sentTo, setSentTo] = useState<string | null>(null);

  if (sentTo) {
    return (
      <Page title="Check your e-mail for the link">
        <Card className="space-y-4">
          <p role="status">
            We sent a confirmation link to <strong>{sentTo}</strong>. Open it to confirm your address; you will be signed in
            straight away.
          </p>
          <p className="text-ink-soft">Nothing after a few minutes? Look in your spam folder, or ask for a new link.</p>
          <ResendLinkButton email={sentTo} />
        </Card>
      </Page>
    );
  }

  return (
    <Page title="Create your account" intro="An account lets you flag misspelt names, keep your scores in Learn and keep your settings, such as your hardiness zone and metric or imperial sizes.">
      <Card>
        <SignUpForm onDone={setSentTo} />
      </Card>
      <p className="mt-6">
        Already have an account? <Link to="/sign-in">Sign in</Link>
      </p>
    </Page>
  );
}
