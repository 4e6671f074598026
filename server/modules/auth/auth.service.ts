import bcrypt from 'bcryptjs';
import { IsNull, type DataSource } from 'typeorm';
import type {
  ChangePasswordInput,
  ResetPasswordInput,
  SignInInput,
  SignUpInput,
  UpdateAccountInput,
} from '../../../shared/schemas/auth';
import { AuthToken, type TokenPurpose } from '../../db/entities/auth-token.entity';
import { User } from '../../db/entities/user.entity';
import { BadRequest, Conflict, Forbidden, HttpError } from '../../errors/http-error';
import { linkMessage, type Mailer } from '../../mail/mailer';
import { hashToken, newToken, RESET_TTL_MS, VERIFY_TTL_MS } from './tokens';

export interface AuthDeps {
  dataSource: DataSource;
  mailer: Mailer;
  publicUrl: string;
  bcryptCost: number;
  log?: (msg: string, err?: unknown) => void;
}

/** Accounts: sign-up with e-mail verification, sign-in, password reset and change. */
export class AuthService {
  private readonly users;
  private readonly tokens;
  /** Compared against when the e-mail is unknown, so both failures take the same time. */
  private readonly dummyHash: string;

  constructor(private readonly deps: AuthDeps) {
    this.users = deps.dataSource.getRepository(User);
    this.tokens = deps.dataSource.getRepository(AuthToken);
    this.dummyHash = bcrypt.hashSync('grovewalk-timing-equaliser', deps.bcryptCost);
  }

  hashPassword(password: string): Promise<string> {
    return bcrypt.hash(password, this.deps.bcryptCost);
  }

  async signUp(input: SignUpInput): Promise<void> {
    const passwordHash = await this.hashPassword(input.password);
    const { token, hash } = newToken();
    const user = await this.deps.dataSource.transaction(async (m) => {
      const existing = await m.getRepository(User).findOne({ where: { email: input.email }, lock: { mode: 'pessimistic_write' } });
      if (existing) {
        throw new Conflict('email_taken', 'An account with that e-mail already exists. Sign in or reset your password.', {
          email: 'Already registered.',
        });
      }
      const u = await m.getRepository(User).save(
        m.getRepository(User).create({
          email: input.email,
          displayName: input.displayName,
          passwordHash,
          ...(input.unitSystem ? { unitSystem: input.unitSystem } : {}),
          ...(input.hardinessZone ? { hardinessZone: input.hardinessZone } : {}),
        }),
      );
      await m.getRepository(AuthToken).insert({ userId: u.id, purpose: 'verify', tokenHash: hash, expiresAt: new Date(Date.now() + VERIFY_TTL_MS) });
      return u;
    });
    await this.sendVerification(user, token);
  }

  private async sendVerification(user: User, token: string) {
    const url = `${this.deps.publicUrl}/verify?token=${encodeURIComponent(token)}`;
    const { text, html } = linkMessage({
      greeting: `Hello ${user.displayName},`,
      lines: ['Welcome to Grovewalk. Please confirm this e-mail address so you can sign in.', 'The link works once and for 48 hours.'],
      linkLabel: 'Confirm my e-mail address',
      url,
      footer: 'If you did not sign up for Grovewalk, ignore this message.',
    });
    await this.safeSend({ to: user.email, subject: 'Confirm your e-mail address for Grovewalk', text, html });
  }

  private async safeSend(msg: { to: string; subject: string; text: string; html?: string }) {
    try {
      await this.deps.mailer.send(msg);
    } catch (err) {
      // The account change stands; the person can ask for the link again.
      this.deps.log?.(`mail to ${msg.to} failed`, err);
    }
  }

  /** Marks a link used inside the caller's transaction, or says precisely why it cannot be used. */
  private async consumeToken(m: DataSource['manager'], token: string, purpose: TokenPurpose): Promise<AuthToken> {
    const row = await m.getRepository(AuthToken).findOne({ where: { tokenHash: hashToken(token), purpose }, lock: { mode: 'pessimistic_write' } });
    if (!row) throw new BadRequest('token_invalid', 'This link is not valid. Ask for a new one.');
    if (row.usedAt) throw new BadRequest('token_used', 'This link has already been used. Ask for a new one if you still need it.');
    if (row.expiresAt.getTime() < Date.now()) throw new BadRequest('token_expired', 'This link has expired. Ask for a new one.');
    await m.getRepository(AuthToken).update({ id: row.id }, { usedAt: new Date() });
    return row;
  }

  async verifyEmail(token: string): Promise<User> {
    return this.deps.dataSource.transaction(async (m) => {
      const row = await this.consumeToken(m, token, 'verify');
      const user = await m.getRepository(User).findOneByOrFail({ id: row.userId });
      if (user.disabledAt) throw new Forbidden('account_disabled', 'This account has been disabled. If you think that is a mistake, ask an admin of your club.');
      if (!user.emailVerifiedAt) {
        user.emailVerifiedAt = new Date();
        await m.getRepository(User).update({ id: user.id }, { emailVerifiedAt: user.emailVerifiedAt });
      }
      return user;
    });
  }

  async resendVerification(email: string): Promise<void> {
    const user = await this.users.findOneBy({ email, emailVerifiedAt: IsNull() });
    if (!user || user.disabledAt) return;
    const { token, hash } = newToken();
    await this.tokens.insert({ userId: user.id, purpose: 'verify', tokenHash: hash, expiresAt: new Date(Date.now() + VERIFY_TTL_MS) });
    await this.sendVerification(user, token);
  }

  async signIn(input: SignInInput): Promise<User> {
    const user = await this.users.findOneBy({ email: input.email });
    const ok = await bcrypt.compare(input.password, user?.passwordHash ?? this.dummyHash);
    if (!user || !ok) throw new HttpError(401, 'bad_credentials', 'That e-mail and password do not match an account.');
    if (user.disabledAt) throw new Forbidden('account_disabled', 'This account has been disabled. If you think that is a mistake, ask an admin of your club.');
    if (!user.emailVerifiedAt) {
      throw new Forbidden('email_unverified', 'Please confirm your e-mail address first: use the link we sent you, or ask for a new one.');
    }
    return user;
  }

  async forgotPassword(email: string): Promise<void> {
    const user = await this.users.findOneBy({ email });
    if (!user || user.disabledAt) return;
    const { token, hash } = newToken();
    await this.tokens.insert({ userId: user.id, purpose: 'reset', tokenHash: hash, expiresAt: new Date(Date.now() + RESET_TTL_MS) });
    const url = `${this.deps.publicUrl}/reset-password?token=${encodeURIComponent(token)}`;
    const { text, html } = linkMessage({
      greeting: `Hello ${user.displayName},`,
      lines: ['Someone asked to reset the password of your Grovewalk account.', 'The link works once and for one hour.'],
      linkLabel: 'Choose a new password',
      url,
      footer: 'If it was not you, ignore this message: your password stays as it is.',
    });
    await this.safeSend({ to: user.email, subject: 'Reset your Grovewalk password', text, html });
  }

  async resetPassword(input: ResetPasswordInput): Promise<void> {
    const passwordHash = await this.hashPassword(input.password);
    await this.deps.dataSource.transaction(async (m) => {
      const row = await this.consumeToken(m, input.token, 'reset');
      const user = await m.getRepository(User).findOneByOrFail({ id: row.userId });
      if (user.disabledAt) throw new Forbidden('account_disabled', 'This account has been disabled. If you think that is a mistake, ask an admin of your club.');
      await m.getRepository(User).update(
        { id: user.id },
        // The link proved the mailbox, so the address counts as confirmed; other sessions end.
        { passwordHash, sessionEpoch: user.sessionEpoch + 1, emailVerifiedAt: user.emailVerifiedAt ?? new Date() },
      );
    });
  }

  /** Returns the new session epoch so the caller keeps this session signed in. */
  async changePassword(user: User, input: ChangePasswordInput): Promise<number> {
    const fresh = await this.users.findOneByOrFail({ id: user.id });
    if (!(await bcrypt.compare(input.currentPassword, fresh.passwordHash))) {
      throw new BadRequest('bad_credentials', 'Your current password is not right.', { currentPassword: 'Not right.' });
    }
    const passwordHash = await this.hashPassword(input.newPassword);
    const epoch = fresh.sessionEpoch + 1;
    await this.users.update({ id: user.id }, { passwordHash, sessionEpoch: epoch });
    return epoch;
  }

  async updateAccount(user: User, input: UpdateAccountInput): Promise<User> {
    const patch: Partial<User> = {};
    if (input.displayName !== undefined) patch.displayName = input.displayName;
    if (input.unitSystem !== undefined) patch.unitSystem = input.unitSystem;
    if (input.hardinessZone !== undefined) patch.hardinessZone = input.hardinessZone;
    if (Object.keys(patch).length) await this.users.update({ id: user.id }, patch);
    return this.users.findOneByOrFail({ id: user.id });
  }
}
