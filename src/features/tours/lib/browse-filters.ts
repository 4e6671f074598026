import type { TourListParams } from '../api/tour-keys';

/** The browse filters of the public tours list, as the address carries them. */
export interface BrowseFilters {
  author?: number;
  garden?: string;
  /** A cultivar record's slug (the API also takes an id). */
  cultivar?: string;
  /** A cultivar Group, without the word "Group" ("Dissectum"). */
  group?: string;
}

/**
 * Acer palmatum cultivar Groups offered in the Group filter (common practice, from memory; no
 * published source — see the domain notes). The server also accepts "Dissectum Group".
 */
export const BROWSE_GROUPS = ['Amoenum', 'Palmatum', 'Matsumurae', 'Dissectum', 'Linearilobum', 'Dwarf'] as const;

const MAX_TEXT = 160;

function text(params: URLSearchParams, key: string, max = MAX_TEXT): string | undefined {
  const v = params.get(key)?.trim();
  return v ? v.slice(0, max) : undefined;
}

/** Reads the filters leniently: a bad author id or an empty field is simply no filter. */
export function filtersFromParams(params: URLSearchParams): BrowseFilters {
  const out: BrowseFilters = {};
  const author = Number(params.get('author'));
  if (Number.isInteger(author) && author >= 1 && author < 1e9) out.author = author;
  const garden = text(params, 'garden');
  if (garden) out.garden = garden;
  const cultivar = text(params, 'cultivar');
  if (cultivar) out.cultivar = cultivar;
  const group = text(params, 'group', 80)?.replace(/\s+group$/i, '');
  if (group) out.group = group;
  return out;
}

/** The address query for filters and a page; page 1 and empty filters are left out. */
export function paramsFromFilters(filters: BrowseFilters, page = 1): URLSearchParams {
  const p = new URLSearchParams();
  if (filters.author) p.set('author', String(filters.author));
  if (filters.garden?.trim()) p.set('garden', filters.garden.trim());
  if (filters.cultivar?.trim()) p.set('cultivar', filters.cultivar.trim());
  if (filters.group?.trim()) p.set('group', filters.group.trim());
  if (page > 1) p.set('page', String(page));
  return p;
}

/** True when any filter is set. */
export function hasFilters(filters: BrowseFilters): boolean {
  return Object.values(filters).some((v) => v !== undefined && v !== '');
}

/** What the list API is asked for: the page plus the filters that are set. */
export function listParams(filters: BrowseFilters, page: number, pageSize: number): TourListParams {
  return { page, pageSize, ...filters };
}
