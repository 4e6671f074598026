import { emailOnlyInput } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { FormError, FormSuccess } from '@/components/form-error';
import { TextField } from '@/components/text-field';
import { errorMessage } from '@/lib/api';
import { useSchemaForm } from '@/lib/use-schema-form';
import { useResendVerification } from '../api/account-api';

/** "Send a new link" for an address we already know (just after sign-up or a refused sign-in). */
export function ResendLinkButton({ email, label = 'Send a new confirmation link' }: { email: string; label?: string }) {
  const resend = useResendVerification();
  if (resend.isSuccess) {
    return (
      <FormSuccess>
        <p>A new link is on its way to {email}. Only the newest link works.</p>
      </FormSuccess>
    );
  }
  return (
    <div className="space-y-2">
      <Button variant="secondary" busy={resend.isPending} onClick={() => resend.mutate({ email })}>
        {label}
      </Button>
      <FormError message={resend.isError ? errorMessage(resend.error) : null} />
    </div>
  );
}

/** The same request with an address field, for when the page does not know the address. */
export function ResendLinkForm() {
  const resend = useResendVerification();
  const { errors, onSubmit } = useSchemaForm(emailOnlyInput, (data) => resend.mutate(data));

  if (resend.isSuccess) {
    return (
      <FormSuccess>
        <p>If that address has an account waiting for confirmation, a new link is on its way. Only the newest link works.</p>
      </FormSuccess>
    );
  }
  return (
    <form noValidate onSubmit={onSubmit} className="space-y-4">
      <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
      <FormError message={resend.isError ? errorMessage(resend.error) : null} />
      <Button type="submit" busy={resend.isPending}>
        Send a new link
      </Button>
    </form>
  );
}
