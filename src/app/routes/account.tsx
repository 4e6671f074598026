import { AccountPage } from '@/features/accounts/components/account-page';
import { RequireUser } from '../guards';

/** /account, for anyone signed in. */
export function AccountRoute() {
  return <RequireUser>{(user) => <AccountPage user={user} />}</RequireUser>;
}
