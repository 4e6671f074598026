import { useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { signInInput } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { FormError } from '@/components/form-error';
import { Page } from '@/components/page';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { safeNextPath, waitInWords } from '@/lib/next-path';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useSignIn } from '../api/account-api';
import { ResendLinkButton } from './resend-link';

/** The sign-in form; it explains refusals that need more than "try again" (unconfirmed, too many tries). */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [triedEmail, setTriedEmail] = useState('');
  const { errors, onSubmit, showServerErrors } = useSchemaForm(signInInput, (data) => {
    setTriedEmail(data.email);
    signIn.mutate(data, { onSuccess: onSignedIn, onError: showServerErrors });
  });
  const error = signIn.error;

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5">
      <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
      <div className="space-y-2">
        <TextField label="Password" name="password" type="password" autoComplete="current-password" error={errors.password} />
        <p className="text-sm">
          <Link to="/forgot-password">Forgotten your password?</Link>
        </p>
      </div>
      <FormError message={error ? errorMessage(error) : null}>
        {isApiError(error, 'email_unverified') && triedEmail && <ResendLinkButton email={triedEmail} />}
        {isApiError(error, 'rate_limited') && <p>{waitInWords(error.retryAfterSeconds) ?? 'Wait a little before trying again.'}</p>}
      </FormError>
      <Button type="submit" busy={signIn.isPending} className="w-full sm:w-auto">
        Sign in
      </Button>
    </form>
  );
}

/** The sign-in page; returns to the page that asked for it (?next=) when that is inside the site. */
export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNextPath(params.get('next'));

  return (
    <Page title="Sign in">
      <Card>
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      </Card>
      <p className="mt-6">
        New to Grovewalk? <Link to="/sign-up">Create an account</Link>
      </p>
    </Page>
  );
}
