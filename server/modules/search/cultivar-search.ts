import { findNames } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import type { MatchReason } from '../../../shared/schemas/search';
import { parseTraitWords, traitReason, type TraitTerm } from '../../../shared/search/trait-words';
import type { Catalogue, CatalogueRecord } from './cultivar-catalogue';

type NameHow = Extract<MatchReason, { kind: 'name' }>['how'];

/**
 * Ranking weights of the ways a record can match by name (Grovewalk's own scale): an exact name
 * first, then a recorded variant, the start of a name, a close spelling, part of a name and last a
 * sound-alike. Fuzzy and phonetic weights are scaled by the matcher's own score.
 */
export const NAME_WEIGHTS: Record<NameHow, number> = { exact: 1, variant: 0.97, prefix: 0.9, fuzzy: 0.95, contains: 0.75, phonetic: 0.9 };
/** A record found only by its traits ranks below any name match. */
const TRAIT_WEIGHT = 0.5;
/** Shortest search that may match the start of a name / any part of one. */
const PREFIX_MIN = 2;
const CONTAINS_MIN = 3;

/** One record found by a search, with every reason and a score for ordering. */
export interface CultivarMatch {
  record: CatalogueRecord;
  score: number;
  /** Best name evidence (0 when only traits matched). */
  nameScore: number;
  nameHow: NameHow | null;
  reasons: MatchReason[];
}

/** The result of matching a search against the catalogue. */
export interface CultivarSearchResult {
  matches: CultivarMatch[];
  terms: TraitTerm[];
}

function startsAtWord(hay: string, needle: string): number {
  let from = 0;
  for (;;) {
    const at = hay.indexOf(needle, from);
    if (at < 0) return -1;
    if (at === 0 || hay[at - 1] === ' ') return at;
    from = at + 1;
  }
}

/** Word indexes (as the trait reader counts words) that a character span of `q` covers. */
function wordIndexesIn(q: string, start: number, end: number): number[] {
  const out: number[] = [];
  let i = 0;
  // Marks count as part of a word here, as folding drops them before the trait reader splits words.
  for (const m of q.matchAll(/[\p{L}\p{M}\p{N}]+/gu)) {
    if (m.index < end && m.index + m[0].length > start) out.push(i);
    i++;
  }
  return out;
}

/**
 * Approved records matched by name (exact, variant, prefix, contains, and the shared name
 * matcher's fuzzy and phonetic matches, so a misspelt or misheard name still finds its record) and
 * by trait words. Words that a name match covers are not read as traits ("Coral …" in a name is
 * not a colour). Trait conditions are all required; when no record meets all of them, the records
 * meeting the most are returned instead, with their reasons saying which.
 */
export function searchCultivars(catalogue: Catalogue, q: string): CultivarSearchResult {
  const qFold = normalizeName(q);
  const found = new Map<number, CultivarMatch>();
  const add = (record: CatalogueRecord, reason: MatchReason, score: number) => {
    let m = found.get(record.cultivar.id);
    if (!m) {
      m = { record, score: 0, nameScore: 0, nameHow: null, reasons: [] };
      found.set(record.cultivar.id, m);
    }
    if (reason.kind === 'name') {
      if (m.reasons.some((r) => r.kind === 'name' && r.how === reason.how && r.matched === reason.matched)) return;
      if (score > m.nameScore) {
        m.nameScore = score;
        m.nameHow = reason.how;
      }
    }
    m.reasons.push(reason);
  };

  if (qFold) {
    for (const r of catalogue.records) {
      const c = r.cultivar;
      if (qFold === r.epithetFold || qFold === r.nameFold) {
        add(r, { kind: 'name', how: 'exact', score: 1, matched: qFold === r.epithetFold ? c.epithet : c.acceptedName, heard: q.trim() }, NAME_WEIGHTS.exact);
        continue;
      }
      const variant = r.variants.find((v) => v.fold === qFold);
      if (variant) {
        add(r, { kind: 'name', how: 'variant', score: 1, matched: variant.text, heard: q.trim() }, NAME_WEIGHTS.variant);
        continue;
      }
      if (qFold.length >= PREFIX_MIN && (r.epithetFold.startsWith(qFold) || r.nameFold.startsWith(qFold))) {
        add(r, { kind: 'name', how: 'prefix', score: 1, matched: r.epithetFold.startsWith(qFold) ? c.epithet : c.acceptedName, heard: q.trim() }, NAME_WEIGHTS.prefix);
        continue;
      }
      if (qFold.length >= CONTAINS_MIN) {
        const inName = r.nameFold.includes(qFold);
        const inVariant = inName ? undefined : r.variants.find((v) => v.fold.includes(qFold));
        if (inName || inVariant) {
          // A hit at the start of a word ("flame" in 'Brindlewick Flame') counts for more than one inside a word.
          const atWord = inName ? startsAtWord(r.nameFold, qFold) >= 0 : startsAtWord(inVariant!.fold, qFold) >= 0;
          const score = atWord ? 1 : 0.8;
          add(r, { kind: 'name', how: 'contains', score, matched: inName ? c.acceptedName : inVariant!.text, heard: q.trim() }, NAME_WEIGHTS.contains * score);
        }
      }
    }
  }

  // Names anywhere in the search, spelt right or wrong ("kumo tsubassa weeping").
  const covered = new Set<number>();
  for (const m of findNames(catalogue.index, q)) {
    const r = catalogue.byId.get(Number(m.recordId));
    if (!r) continue;
    for (const w of wordIndexesIn(q, m.start, m.end)) covered.add(w);
    const how: NameHow = m.kind;
    const matched = how === 'variant' ? (r.variants.find((v) => v.fold === normalizeName(m.matchedText))?.text ?? r.cultivar.epithet) : r.cultivar.epithet;
    add(r, { kind: 'name', how, score: m.score, matched, heard: m.matchedText }, NAME_WEIGHTS[how] * (how === 'exact' || how === 'variant' ? 1 : m.score));
  }
  // A search that is exactly one record's name is about that record, not about traits.
  for (const m of found.values()) {
    if (m.nameHow === 'exact' || m.nameHow === 'variant') {
      if (m.reasons.some((r) => r.kind === 'name' && r.heard === q.trim())) {
        for (const w of wordIndexesIn(q, 0, q.length)) covered.add(w);
      }
    }
  }

  const { terms } = parseTraitWords(q, covered);
  if (terms.length) {
    const scored: { r: CatalogueRecord; reasons: MatchReason[] }[] = [];
    let best = 0;
    for (const r of catalogue.records) {
      const reasons = terms.map((t) => traitReason(r.cultivar.traits, t)).filter((x) => x !== null);
      if (!reasons.length) continue;
      best = Math.max(best, reasons.length);
      scored.push({ r, reasons });
    }
    for (const { r, reasons } of scored) {
      if (reasons.length < best) continue;
      for (const reason of reasons) add(r, reason, 0);
    }
  }

  for (const m of found.values()) {
    const traitCount = m.reasons.filter((r) => r.kind === 'trait').length;
    m.score = Math.round((m.nameScore + (terms.length ? (TRAIT_WEIGHT * traitCount) / terms.length : 0) * (m.nameScore ? 0.1 : 1)) * 1000) / 1000;
  }
  const matches = [...found.values()].sort(
    (a, b) => b.score - a.score || a.record.cultivar.acceptedName.localeCompare(b.record.cultivar.acceptedName) || a.record.cultivar.id - b.record.cultivar.id,
  );
  return { matches, terms };
}
