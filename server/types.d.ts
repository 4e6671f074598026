import 'express-session';
import type { User } from './db/entities/user.entity';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
    epoch?: number;
    csrfToken?: string;
  }
}

declare global {
  namespace Express {
    interface Request {
      /** The signed-in user, loaded once per request by `authenticate`. */
      user?: User;
    }
  }
}
