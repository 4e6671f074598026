import { ForgotPasswordPage } from '@/features/accounts/components/forgot-password-page';
import { ResetPasswordPage } from '@/features/accounts/components/reset-password-page';
import { SignInPage } from '@/features/accounts/components/sign-in-page';
import { SignUpPage } from '@/features/accounts/components/sign-up-page';
import { VerifyEmailPage } from '@/features/accounts/components/verify-email-page';
import { SignedOutOnly } from '../guards';

/** /sign-in */
export function SignInRoute() {
  return (
    <SignedOutOnly>
      <SignInPage />
    </SignedOutOnly>
  );
}

/** /sign-up */
export function SignUpRoute() {
  return (
    <SignedOutOnly>
      <SignUpPage />
    </SignedOutOnly>
  );
}

/** /verify?token=… (from the confirmation e-mail; works signed in or out) */
export function VerifyRoute() {
  return <VerifyEmailPage />;
}

/** /forgot-password */
export function ForgotPasswordRoute() {
  return <ForgotPasswordPage />;
}

/** /reset-password?token=… (from the reset e-mail) */
export function ResetPasswordRoute() {
  return <ResetPasswordPage />;
}
