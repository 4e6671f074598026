import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  publicUserSchema,
  type ChangePasswordInput,
  type EmailOnlyInput,
  type PublicUser,
  type ResetPasswordInput,
  type SignInInput,
  type SignUpInput,
  type TokenInput,
  type UpdateAccountInput,
} from '@shared/schemas/auth';
import { api } from '@/lib/api';
import { useApplySession } from '@/lib/auth';
import { accountKeys } from './account-keys';

const userResponse = z.object({ user: publicUserSchema });
const okResponse = z.object({ ok: z.literal(true) });

/** Creates an unconfirmed account; the server mails a confirmation link and does not sign in. */
export function signUp(input: SignUpInput) {
  return api.post('/api/auth/sign-up', input, { schema: okResponse });
}

/** Spends a confirmation token; the server confirms the address and opens a session. */
export function verifyEmail(input: TokenInput): Promise<PublicUser> {
  return api.post('/api/auth/verify', input, { schema: userResponse, sessionChange: true }).then((r) => r.user);
}

/** Asks for a new confirmation link; the answer is the same whether or not the address is known. */
export function resendVerification(input: EmailOnlyInput) {
  return api.post('/api/auth/resend-verification', input, { schema: okResponse });
}

/** Opens a session. */
export function signIn(input: SignInInput): Promise<PublicUser> {
  return api.post('/api/auth/sign-in', input, { schema: userResponse, sessionChange: true }).then((r) => r.user);
}

/** Asks for a password-reset link; the answer never reveals whether the address has an account. */
export function forgotPassword(input: EmailOnlyInput) {
  return api.post('/api/auth/forgot-password', input, { schema: okResponse });
}

/** Sets a new password with the token from the reset e-mail. */
export function resetPassword(input: ResetPasswordInput) {
  return api.post('/api/auth/reset-password', input, { schema: okResponse });
}

/** Changes the password of the signed-in person, who proves it with the current one. */
export function changePassword(input: ChangePasswordInput) {
  return api.post('/api/auth/change-password', input, { schema: okResponse });
}

/** Saves the display name and/or preferred units. */
export function updateAccount(input: UpdateAccountInput): Promise<PublicUser> {
  return api.patch('/api/account', input, { schema: userResponse }).then((r) => r.user);
}

/** Sign-up form submission. */
export function useSignUp() {
  return useMutation({ mutationFn: signUp });
}

/** Confirmation link; on success the new session is recorded in the cache. */
export function useVerifyEmail() {
  const applySession = useApplySession();
  return useMutation({ mutationFn: verifyEmail, onSuccess: (user) => applySession(user) });
}

/** "Send a new link" on the sign-in, sign-up and confirmation pages. */
export function useResendVerification() {
  return useMutation({ mutationFn: resendVerification });
}

/** Sign-in form; on success the new session is recorded in the cache. */
export function useSignIn() {
  const applySession = useApplySession();
  return useMutation({ mutationFn: signIn, onSuccess: (user) => applySession(user) });
}

/** Forgotten-password form. */
export function useForgotPassword() {
  return useMutation({ mutationFn: forgotPassword });
}

/** Reset-password form. */
export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}

/** Change-password form on the account page. */
export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}

/** Profile form on the account page; the answer replaces "me" and everything under the account key is refreshed. */
export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccount,
    onSuccess: (user) => {
      queryClient.setQueryData(accountKeys.me(), user);
      void queryClient.invalidateQueries({ queryKey: accountKeys.all });
    },
  });
}

/** Only the fields that differ from what is saved, so an unchanged form sends nothing. */
export function changedProfile(user: PublicUser, input: UpdateAccountInput): UpdateAccountInput {
  const patch: UpdateAccountInput = {};
  if (input.displayName !== undefined && input.displayName !== user.displayName) patch.displayName = input.displayName;
  if (input.unitSystem !== undefined && input.unitSystem !== user.unitSystem) patch.unitSystem = input.unitSystem;
  return patch;
}
