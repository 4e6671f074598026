import { hasRole } from '@shared/schemas/common';
import { NewTourPage, UploadNotAllowed } from '@/features/tours/components/new-tour-page';
import { RequireUser } from '../guards';

/** /tours/new: authors and above upload; other members are told how to become an author. */
export function NewTourRoute() {
  return <RequireUser>{(user) => (hasRole(user.role, 'author') ? <NewTourPage /> : <UploadNotAllowed />)}</RequireUser>;
}
