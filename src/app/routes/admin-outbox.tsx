import { OutboxPage } from '@/features/admin/components/outbox-page';
import { RequireUser } from '../guards';

/** /admin/outbox, admins only. */
export function AdminOutboxRoute() {
  return <RequireUser role="admin">{() => <OutboxPage />}</RequireUser>;
}
