import { Link, useSearchParams } from 'react-router';
import { PASSWORD_MIN, resetPasswordInput } from '@shared/schemas/auth';
import { Button, buttonClasses } from '@/components/button';
import { Card } from '@/components/card';
import { FormError, FormSuccess } from '@/components/form-error';
import { Page } from '@/components/page';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useResetPassword } from '../api/account-api';

const linkProblems: Record<string, string> = {
  token_expired: 'This reset link has expired.',
  token_used: 'This reset link has already been used.',
  token_invalid: 'This reset link is not valid.',
};

/** Opened from the reset e-mail: sets a new password with the token in the address. */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token')?.trim() ?? '';
  const reset = useResetPassword();
  const { errors, onSubmit, showServerErrors } = useSchemaForm(resetPasswordInput, (data) =>
    reset.mutate(data, { onError: showServerErrors }),
  );
  const linkProblem = isApiError(reset.error) ? linkProblems[reset.error.code] : undefined;

  if (!token || errors.token || linkProblem) {
    return (
      <Page title="Choose a new password">
        <FormError message={linkProblem ?? errors.token ?? 'This link is incomplete: it has no reset code.'}>
          <p>
            <Link to="/forgot-password">Ask for a new reset link</Link>
          </p>
        </FormError>
      </Page>
    );
  }

  if (reset.isSuccess) {
    return (
      <Page title="Choose a new password">
        <FormSuccess>
          <p className="font-bold">Your password is changed.</p>
          <p>Sign in with your new password from now on.</p>
        </FormSuccess>
        <Link to="/sign-in" className={buttonClasses('primary', 'md', 'mt-6')}>
          Go to sign in
        </Link>
      </Page>
    );
  }

  return (
    <Page title="Choose a new password">
      <Card>
        <form noValidate onSubmit={onSubmit} className="space-y-5">
          <input type="hidden" name="token" value={token} />
          <TextField
            label="New password"
            name="password"
            type="password"
            autoComplete="new-password"
            hint={`At least ${PASSWORD_MIN} characters.`}
            error={errors.password}
          />
          <FormError message={reset.isError ? errorMessage(reset.error) : null} />
          <Button type="submit" busy={reset.isPending}>
            Save new password
          </Button>
        </form>
      </Card>
    </Page>
  );
}
