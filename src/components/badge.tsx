import type { ReactNode } from 'react';
import type { Role } from '@shared/schemas/common';

/** Colour families for small labels; each pairs a wash with a dark text colour that passes AA. */
export type BadgeTone = 'moss' | 'bark' | 'maple' | 'ochre' | 'plain';

const tones: Record<BadgeTone, string> = {
  moss: 'bg-moss-wash text-moss-deep',
  bark: 'bg-bark-wash text-bark',
  maple: 'bg-maple-wash text-maple',
  ochre: 'bg-ochre-wash text-ochre',
  plain: 'border border-rule bg-card text-ink-soft',
};

/** A short status or category word beside a name. */
export function Badge({ tone = 'plain', children }: { tone?: BadgeTone; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center rounded-full px-2.5 py-0.5 font-ui text-xs font-semibold tracking-wide ${tones[tone]}`}>
      {children}
    </span>
  );
}

const roleLabels: Record<Role, string> = { viewer: 'Viewer', author: 'Author', moderator: 'Moderator', admin: 'Admin' };
const roleTones: Record<Role, BadgeTone> = { viewer: 'plain', author: 'moss', moderator: 'bark', admin: 'maple' };

/** Display name of a role, for selects and badges. */
export function roleLabel(role: Role): string {
  return roleLabels[role];
}

/** A member's role, coloured the same way wherever people are listed. */
export function RoleBadge({ role }: { role: Role }) {
  return <Badge tone={roleTones[role]}>{roleLabels[role]}</Badge>;
}
