import { Card } from '@/components/card';
import { AccountPage } from '@/features/accounts/components/account-page';
import { GardenSettings } from '@/features/preferences/components/garden-settings';
import { RequireUser } from '../guards';

/** /account, for anyone signed in; the garden settings sit under the profile (units are set there). */
export function AccountRoute() {
  return (
    <RequireUser>
      {(user) => (
        <AccountPage
          user={user}
          extraSections={
            <Card>
              <GardenSettings showUnits={false} />
            </Card>
          }
        />
      )}
    </RequireUser>
  );
}
