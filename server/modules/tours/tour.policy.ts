import { hasRole } from '../../../shared/schemas/common';
import type { Tour } from '../../db/entities/tour.entity';
import type { User } from '../../db/entities/user.entity';

/** Published tours are public; everything else only to the author, moderators and admins. */
export function canViewTour(user: User | undefined, tour: Tour): boolean {
  return tour.state === 'published' || canEditTour(user, tour);
}

/** The author (still an author or above), moderators and admins may change a tour. */
export function canEditTour(user: User | undefined, tour: Tour): boolean {
  if (!user) return false;
  if (hasRole(user.role, 'moderator')) return true;
  return user.id === tour.authorId && hasRole(user.role, 'author');
}
