import { useEffect, useRef } from 'react';
import { Link, useSearchParams } from 'react-router';
import { buttonClasses } from '@/components/button';
import { Card } from '@/components/card';
import { FormError, FormSuccess } from '@/components/form-error';
import { Page } from '@/components/page';
import { Loading } from '@/components/spinner';
import { errorMessage, isApiError } from '@/lib/api';
import { useVerifyEmail } from '../api/account-api';
import { ResendLinkForm } from './resend-link';

const problems: Record<string, string> = {
  token_expired: 'This confirmation link has expired. Ask for a new one below.',
  token_used: 'This confirmation link has already been used. If you confirmed your address, you can sign in.',
  token_invalid: 'This confirmation link is not valid. Check that you opened the whole link, or ask for a new one below.',
};

/** Wording for a failed confirmation: our own for the known token codes, the server's otherwise. */
export function verifyProblem(error: unknown): string {
  if (isApiError(error) && error.code in problems) return problems[error.code] ?? errorMessage(error);
  return errorMessage(error);
}

function Problem({ message }: { message: string }) {
  return (
    <div className="space-y-6">
      <FormError message={message}>
        <p>
          Already confirmed? <Link to="/sign-in">Sign in</Link>
        </p>
      </FormError>
      <Card>
        <h2 className="text-xl">Send a new link</h2>
        <p className="mt-1 mb-4 text-ink-soft">Enter the address you signed up with.</p>
        <ResendLinkForm />
      </Card>
    </div>
  );
}

/** Opened from the confirmation e-mail: spends the token once and reports the outcome. */
export function VerifyEmailPage() {
  const [params] = useSearchParams();
  const token = params.get('token')?.trim() ?? '';
  const verify = useVerifyEmail();
  const { mutate } = verify;
  // A token works once: the ref stops React's development double-run from spending it twice.
  const sentFor = useRef<string | null>(null);

  useEffect(() => {
    if (!token || sentFor.current === token) return;
    sentFor.current = token;
    mutate({ token });
  }, [token, mutate]);

  if (!token) {
    return (
      <Page title="Confirm your e-mail address">
        <Problem message="This link is incomplete: it has no confirmation code. Open the link from the e-mail again, or ask for a new one." />
      </Page>
    );
  }

  return (
    <Page title="Confirm your e-mail address">
      {verify.isError ? (
        <Problem message={verifyProblem(verify.error)} />
      ) : verify.isSuccess ? (
        <div className="space-y-6">
          <FormSuccess>
            <p className="font-bold">Your e-mail address is confirmed.</p>
            <p>You are signed in as {verify.data.displayName}.</p>
          </FormSuccess>
          <div className="flex flex-wrap gap-3">
            <Link to="/" className={buttonClasses('primary')}>
              Go to the home page
            </Link>
            <Link to="/account" className={buttonClasses('secondary')}>
              Account settings
            </Link>
          </div>
        </div>
      ) : (
        <Loading label="Confirming your e-mail address…" />
      )}
    </Page>
  );
}
