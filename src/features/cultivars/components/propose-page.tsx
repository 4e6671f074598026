import { Link, useNavigate } from 'react-router';
import { hasRole } from '@shared/schemas/common';
import { Page } from '@/components/page';
import { useMe } from '@/lib/auth';
import { useReaderPrefs } from '@/features/preferences/hooks/use-reader-prefs';
import { useProposeCultivar } from '../api/cultivars-api';
import { RecordForm } from './record-form';

/** /cultivars/new — an author proposes a record; a moderator's new record is approved at once. */
export function ProposePage() {
  const propose = useProposeCultivar();
  const navigate = useNavigate();
  const { data: me } = useMe();
  const { prefs } = useReaderPrefs();
  const moderator = hasRole(me?.role, 'moderator');
  return (
    <Page
      title="Propose a cultivar record"
      width="medium"
      intro={
        moderator
          ? 'As a moderator, the record you add is approved at once.'
          : 'A moderator checks the name and approves the record; until then only you and the moderators can see it.'
      }
    >
      <p className="-mt-4 mb-6 text-sm">
        Check first that the tree is not already in the <Link to="/cultivars">cultivar records</Link> under another spelling.
      </p>
      <RecordForm
        initial={null}
        system={prefs.unitSystem}
        submitLabel={moderator ? 'Add the record' : 'Send the proposal'}
        busy={propose.isPending}
        error={propose.error}
        onSubmit={(input) =>
          propose.mutate(input, {
            onSuccess: (record) =>
              navigate(`/cultivars/${record.slug}`, {
                state: { notice: record.status === 'approved' ? 'Record added and approved.' : 'Thank you — your proposal is waiting for a moderator. You can add photos below.' },
              }),
          })
        }
      />
    </Page>
  );
}
