import { AuthToken } from './auth-token.entity';
import { Club } from './club.entity';
import { Job } from './job.entity';
import { OutboxMessage } from './outbox-message.entity';
import { Tour } from './tour.entity';
import { User } from './user.entity';

/** Every entity the data source knows; add new ones here. */
export const ENTITIES = [User, AuthToken, OutboxMessage, Club, Tour, Job];
