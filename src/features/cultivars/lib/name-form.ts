import { formatNameParts, validateNameParts, type NameParts, type NameSegment } from '@shared/names/cultivar-name';

/** The name fields of the record form, named as the API names them. */
export interface NameFormValues {
  genus: string;
  species: string;
  infraspecificRank: string;
  infraspecificEpithet: string;
  groupName: string;
  epithet: string;
}

/** An empty name, with the genus most tours in the demo club are about. */
export const EMPTY_NAME: NameFormValues = { genus: 'Acer', species: 'palmatum', infraspecificRank: '', infraspecificEpithet: '', groupName: '', epithet: '' };

function partsOf(v: NameFormValues): NameParts {
  return {
    genus: v.genus,
    species: v.species || undefined,
    infraspecificRank: v.infraspecificRank || undefined,
    infraspecificEpithet: v.infraspecificEpithet || undefined,
    group: v.groupName || undefined,
    epithet: v.epithet || undefined,
  };
}

/** How the name will print, with italics, while it is being typed. */
export function namePreview(v: NameFormValues): NameSegment[] {
  return formatNameParts(partsOf(v));
}

/**
 * The shared writing checks (ICNCP conventions as summarised by the RHS) as one message per form
 * field, so the form shows the same words the server would send back, before anything is sent.
 */
export function nameProblemsByField(v: NameFormValues): Record<string, string> {
  const out: Record<string, string> = {};
  if (!v.epithet.trim()) out.epithet = 'Enter the cultivar epithet.';
  for (const p of validateNameParts(partsOf(v))) {
    const field = p.field === 'group' ? 'groupName' : p.field;
    out[field] = out[field] ? `${out[field]} ${p.message}` : p.message;
  }
  return out;
}

/** The name fields as the API takes them: empty optional parts sent as null. */
export function nameInputOf(v: NameFormValues) {
  const orNull = (s: string) => (s.trim() ? s.trim() : null);
  return {
    genus: v.genus.trim(),
    species: orNull(v.species),
    infraspecificRank: (orNull(v.infraspecificRank) as 'subsp.' | 'var.' | 'f.' | null),
    infraspecificEpithet: orNull(v.infraspecificEpithet),
    groupName: orNull(v.groupName),
    epithet: v.epithet.trim(),
  };
}
