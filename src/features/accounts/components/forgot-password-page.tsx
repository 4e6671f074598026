import { useState } from 'react';
import { Link } from 'react-router';
import { emailOnlyInput } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { FormError, FormSuccess } from '@/components/form-error';
import { Page } from '@/components/page';
import { TextField } from '@/components/text-field';
import { errorMessage } from '@/lib/api';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useForgotPassword } from '../api/account-api';

/** Asks for a reset link; the answer is worded so it never tells whether an address has an account. */
export function ForgotPasswordPage() {
  const forgot = useForgotPassword();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { errors, onSubmit } = useSchemaForm(emailOnlyInput, (data) =>
    forgot.mutate(data, { onSuccess: () => setSentTo(data.email) }),
  );

  return (
    <Page title="Forgotten password" intro="We will e-mail you a link to choose a new password.">
      {sentTo ? (
        <FormSuccess>
          <p>
            If <strong>{sentTo}</strong> belongs to an account here, a link to choose a new password is on its way. It works
            once and for a limited time.
          </p>
          <p className="mt-2">
            <Link to="/sign-in">Back to sign in</Link>
          </p>
        </FormSuccess>
      ) : (
        <Card>
          <form noValidate onSubmit={onSubmit} className="space-y-5">
            <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
            <FormError message={forgot.isError ? errorMessage(forgot.error) : null} />
            <Button type="submit" busy={forgot.isPending}>
              Send the link
            </Button>
          </form>
        </Card>
      )}
    </Page>
  );
}
