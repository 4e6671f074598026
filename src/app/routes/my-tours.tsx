import { MyToursPage } from '@/features/tours/components/my-tours-page';
import { UploadNotAllowed } from '@/features/tours/components/new-tour-page';
import { hasRole } from '@shared/schemas/common';
import { RequireUser } from '../guards';

/** /my/tours, the signed-in author's own tours. */
export function MyToursRoute() {
  return <RequireUser>{(user) => (hasRole(user.role, 'author') ? <MyToursPage /> : <UploadNotAllowed />)}</RequireUser>;
}
