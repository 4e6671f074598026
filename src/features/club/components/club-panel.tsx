import type { Club } from '@shared/schemas/club';
import { Badge, RoleBadge } from '@/components/badge';

/** The club's name, description and members; a fictional club says so before anything else. */
export function ClubPanel({ club }: { club: Club }) {
  return (
    <section aria-labelledby="club-name" className="rounded-xl border border-rule bg-card p-5 shadow-leaf sm:p-8">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="club-name" className="text-2xl text-moss-deep sm:text-3xl">
          {club.name}
        </h2>
        {club.fictional && <Badge tone="ochre">Fictional demo club</Badge>}
      </div>
      {club.fictional && (
        <p className="mt-3 rounded-md border-l-4 border-ochre bg-ochre-wash px-4 py-2 text-sm">
          This club is invented to show how Grovewalk works. Its members, their gardens and the cultivar names in their walks are
          fictional too.
        </p>
      )}
      <p className="mt-4 max-w-prose text-lg">{club.blurb}</p>

      <h3 className="mt-8 text-xl">Members</h3>
      {club.members.length === 0 ? (
        <p className="mt-2 text-ink-soft">No members are listed yet.</p>
      ) : (
        <ul className="mt-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {club.members.map((member) => (
            <li key={member.id} className="flex gap-3 rounded-lg border border-rule bg-paper p-4">
              <span aria-hidden="true" className="grid size-10 shrink-0 place-items-center rounded-full bg-bark text-lg font-bold text-card">
                {member.displayName.trim().charAt(0).toUpperCase() || '?'}
              </span>
              <div className="min-w-0">
                <p className="flex flex-wrap items-center gap-2 font-bold">
                  {member.displayName} <RoleBadge role={member.role} />
                </p>
                <p className="mt-1 text-sm text-ink-soft">{member.garden ?? 'No garden listed'}</p>
              </div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
