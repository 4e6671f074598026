import { Router, type Request } from 'express';
import {
  changePasswordInput,
  emailOnlyInput,
  resetPasswordInput,
  signInInput,
  signUpInput,
  tokenInput,
  updateAccountInput,
} from '../../../shared/schemas/auth';
import type { User } from '../../db/entities/user.entity';
import { requireUser } from '../../middleware/auth';
import { credentialLimiter, mailLimiter } from '../../middleware/rate-limit';
import { validateBody } from '../../middleware/validate';
import type { AuthService } from './auth.service';
import { presentMe } from './user.presenter';

/** Starts a new session for the user (a fresh id defeats session fixation). */
function signInSession(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = user.id;
      req.session.epoch = user.sessionEpoch;
      req.session.save((e) => (e ? reject(e) : resolve()));
    });
  });
}

function endSession(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}

/** /api/auth and /api/account. CSRF is checked by the app for every change. */
export function authRouter(auth: AuthService, opts: { signInLimit: number; csrfToken: (req: Request) => string }): Router {
  const r = Router();

  r.get('/auth/csrf', (req, res) => {
    res.set('Cache-Control', 'no-store').json({ token: opts.csrfToken(req) });
  });

  r.get('/auth/me', (req, res) => {
    res.set('Cache-Control', 'no-store').json({ user: req.user ? presentMe(req.user) : null });
  });

  r.post('/auth/sign-up', mailLimiter(20), validateBody(signUpInput), async (req, res) => {
    await auth.signUp(req.body);
    res.status(201).json({ ok: true });
  });

  r.post('/auth/verify', validateBody(tokenInput), async (req, res) => {
    const user = await auth.verifyEmail(req.body.token);
    await signInSession(req, user);
    res.json({ user: presentMe(user) });
  });

  r.post('/auth/resend-verification', mailLimiter(), validateBody(emailOnlyInput), async (req, res) => {
    await auth.resendVerification(req.body.email);
    res.status(202).json({ ok: true });
  });

  r.post('/auth/sign-in', credentialLimiter(opts.signInLimit), validateBody(signInInput), async (req, res) => {
    const user = await auth.signIn(req.body);
    await signInSession(req, user);
    res.json({ user: presentMe(user) });
  });

  r.post('/auth/sign-out', async (req, res) => {
    await endSession(req);
    res.clearCookie('grovewalk.sid');
    res.status(204).end();
  });

  r.post('/auth/forgot-password', mailLimiter(), validateBody(emailOnlyInput), async (req, res) => {
    await auth.forgotPassword(req.body.email);
    res.status(202).json({ ok: true });
  });

  r.post('/auth/reset-password', credentialLimiter(opts.signInLimit), validateBody(resetPasswordInput), async (req, res) => {
    await auth.resetPassword(req.body);
    res.json({ ok: true });
  });

  r.post('/auth/change-password', requireUser, validateBody(changePasswordInput), async (req, res) => {
    req.session.epoch = await auth.changePassword(req.user!, req.body);
    res.json({ ok: true });
  });

  r.patch('/account', requireUser, validateBody(updateAccountInput), async (req, res) => {
    const user = await auth.updateAccount(req.user!, req.body);
    res.json({ user: presentMe(user) });
  });

  return r;
}
