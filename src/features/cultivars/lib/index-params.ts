import {
  CULTIVAR_SORTS,
  type CultivarIndexQuery,
} from '@shared/schemas/cultivars';
import { CONTAINER_SUITABILITIES, HABITS, LEAF_FORMS, type ContainerSuitability, type Habit, type LeafForm } from '@shared/traits';

/** Rows per page of the index table. */
export const INDEX_PAGE_SIZE = 20;

/**
 * Cultivar Groups of Acer palmatum in horticultural use, offered in the Group filter (common
 * practice, from memory; no published source — see domain.md).
 */
export const COMMON_GROUPS = ['Amoenum', 'Palmatum', 'Matsumurae', 'Dissectum', 'Linearilobum', 'Dwarf'] as const;

/** The orders the index offers, as one choice each (column and direction together). */
export const INDEX_ORDERS = {
  'name-asc': { sort: 'name', dir: 'asc', label: 'Name, A to Z' },
  'name-desc': { sort: 'name', dir: 'desc', label: 'Name, Z to A' },
  'updated-desc': { sort: 'updated', dir: 'desc', label: 'Recently updated first' },
  'updated-asc': { sort: 'updated', dir: 'asc', label: 'Least recently updated first' },
} as const;
/** One entry of INDEX_ORDERS. */
export type IndexOrder = keyof typeof INDEX_ORDERS;

/** Record statuses a moderator can list; everyone else sees approved records only. */
export const INDEX_STATUSES = ['approved', 'proposed', 'retired', 'any'] as const;
type IndexStatus = (typeof INDEX_STATUSES)[number];

/** The index filters as the address holds them; anything unknown is simply left out. */
export interface IndexFilters {
  q: string;
  group: string;
  leafForm: LeafForm | '';
  habit: Habit | '';
  container: ContainerSuitability | '';
  status: IndexStatus;
  order: IndexOrder;
  page: number;
}

function oneOf<T extends string>(list: readonly T[], value: string | null): T | '' {
  return value !== null && (list as readonly string[]).includes(value) ? (value as T) : '';
}

/**
 * Reads the filters from the address leniently (a hand-edited or old link never breaks the page):
 * unknown values fall back to "any", the page to 1, the order to name A–Z. The status filter is
 * only honoured for moderators, since the server shows others approved records anyway.
 */
export function filtersFromParams(params: URLSearchParams, moderator: boolean): IndexFilters {
  const pageRaw = params.get('page') ?? '';
  const page = /^\d{1,6}$/.test(pageRaw) && Number(pageRaw) >= 1 ? Number(pageRaw) : 1;
  const order = (params.get('order') ?? '') in INDEX_ORDERS ? (params.get('order') as IndexOrder) : 'name-asc';
  const status = moderator ? oneOf(INDEX_STATUSES, params.get('status')) || 'approved' : 'approved';
  return {
    q: (params.get('q') ?? '').trim().slice(0, 100),
    group: (params.get('group') ?? '').trim().slice(0, 80),
    leafForm: oneOf(LEAF_FORMS, params.get('leafForm')),
    habit: oneOf(HABITS, params.get('habit')),
    container: oneOf(CONTAINER_SUITABILITIES, params.get('container')),
    status,
    order,
    page,
  };
}

/** The address form of the filters: defaults are left out so links stay short. */
export function paramsFromFilters(f: IndexFilters): URLSearchParams {
  const p = new URLSearchParams();
  if (f.q) p.set('q', f.q);
  if (f.group) p.set('group', f.group);
  if (f.leafForm) p.set('leafForm', f.leafForm);
  if (f.habit) p.set('habit', f.habit);
  if (f.container) p.set('container', f.container);
  if (f.status !== 'approved') p.set('status', f.status);
  if (f.order !== 'name-asc') p.set('order', f.order);
  if (f.page > 1) p.set('page', String(f.page));
  return p;
}

/** The API query for the filters (GET /api/cultivars). */
export function apiQueryFromFilters(f: IndexFilters): Partial<CultivarIndexQuery> {
  const o = INDEX_ORDERS[f.order];
  const q: Partial<CultivarIndexQuery> = { page: f.page, pageSize: INDEX_PAGE_SIZE, sort: o.sort as (typeof CULTIVAR_SORTS)[number], dir: o.dir };
  if (f.q) q.q = f.q;
  if (f.group) q.group = f.group;
  if (f.leafForm) q.leafForm = f.leafForm;
  if (f.habit) q.habit = f.habit;
  if (f.container) q.container = f.container;
  if (f.status !== 'approved') q.status = f.status;
  return q;
}

/** True when any filter narrows the list (so an empty table can say "nothing matches"). */
export function isFiltered(f: IndexFilters): boolean {
  return !!(f.q || f.group || f.leafForm || f.habit || f.container || f.status !== 'approved');
}
