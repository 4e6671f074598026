/**
 * Hepburn romanisation: syllable splitting and plain-English respelling of romanised Japanese
 * cultivar epithets. Pure string code, shared by client and server.
 *
 * The syllable inventory is the modified Hepburn table (gojūon, dakuon, handakuon and yōon rows,
 * moraic n written n, or n' before a vowel or y). Two spellings from traditional Hepburn are also
 * accepted because nursery labels still use them: m for the moraic n before b, m, p
 * ("Shimbashi"), and wo for the particle o.
 */

/** Result of splitting a word: its syllables, or the reasons it is not Hepburn. */
export type HepburnSplit = { ok: true; syllables: string[] } | { ok: false; problems: string[] };

type SyllableKind = 'vowel' | 'consonant-vowel' | 'palatal' | 'moraic-n' | 'geminate';

interface Syllable {
  text: string;
  kind: SyllableKind;
  onset: string;
  vowel: string;
  long: boolean;
}

const PLAIN_VOWELS = new Set(['a', 'i', 'u', 'e', 'o']);
const MARKED_VOWELS: Record<string, string> = {
  ā: 'a', ī: 'i', ū: 'u', ē: 'e', ō: 'o',
  â: 'a', î: 'i', û: 'u', ê: 'e', ô: 'o',
};

/** Onsets and the vowels each may carry in the modified Hepburn table. */
const ONSETS: Record<string, string> = {
  k: 'aiueo', g: 'aiueo', s: 'aueo', z: 'aueo', t: 'aeo', d: 'aeo', n: 'aiueo', h: 'aieo',
  b: 'aiueo', p: 'aiueo', m: 'aiueo', r: 'aiueo', y: 'auo', w: 'ao', f: 'u', j: 'aiuo',
  sh: 'aiuo', ch: 'aiuo', ts: 'u',
  ky: 'auo', gy: 'auo', ny: 'auo', hy: 'auo', by: 'auo', py: 'auo', my: 'auo', ry: 'auo',
};

/** Spellings from other systems (Kunrei-shiki, Nihon-shiki) with their Hepburn form. */
const OTHER_SYSTEM: Record<string, string> = {
  si: 'shi', ti: 'chi', tu: 'tsu', hu: 'fu', zi: 'ji', di: 'ji', du: 'zu',
  sya: 'sha', syu: 'shu', syo: 'sho', tya: 'cha', tyu: 'chu', tyo: 'cho',
  zya: 'ja', zyu: 'ju', zyo: 'jo', dya: 'ja', dyu: 'ju', dyo: 'jo',
  wi: 'i', we: 'e', cch: 'tch',
};

const FOREIGN_LETTERS = new Set(['l', 'q', 'v', 'x']);
const GEMINABLE = new Set(['k', 's', 't', 'p']);
const APOSTROPHES = new Set(["'", '’']);

function vowelAt(s: string, i: number): { vowel: string; marked: boolean } | null {
  const c = s[i];
  if (c === undefined) return null;
  if (PLAIN_VOWELS.has(c)) return { vowel: c, marked: false };
  const base = MARKED_VOWELS[c];
  return base ? { vowel: base, marked: true } : null;
}

/** Reads a vowel at i, folding a doubled vowel, ou or a macron into one long syllable. */
function readVowel(s: string, i: number): { vowel: string; long: boolean; length: number } | null {
  const v = vowelAt(s, i);
  if (!v) return null;
  if (v.marked) return { vowel: v.vowel, long: true, length: 1 };
  const next = s[i + 1];
  if (next === v.vowel || (v.vowel === 'o' && next === 'u')) return { vowel: v.vowel, long: true, length: 2 };
  return { vowel: v.vowel, long: false, length: 1 };
}

function splitElement(element: string): { ok: true; syllables: Syllable[] } | { ok: false; problems: string[] } {
  const s = element.normalize('NFC').toLowerCase();
  const problems: string[] = [];
  if (s.length === 0) return { ok: false, problems: ['empty word'] };

  for (const ch of new Set(s)) {
    if (FOREIGN_LETTERS.has(ch)) problems.push(`"${ch}" is not used in Hepburn romanisation`);
    else if (!/[a-z]/.test(ch) && !(ch in MARKED_VOWELS) && !APOSTROPHES.has(ch)) {
      problems.push(`"${ch}" is not a letter of Hepburn romanisation`);
    }
  }
  if (/c(?!h)/.test(s)) problems.push('"c" is only used in "ch" in Hepburn romanisation');
  if (problems.length > 0) return { ok: false, problems };

  const out: Syllable[] = [];
  let i = 0;
  while (i < s.length) {
    const c = s[i]!;
    const at = `at "${s.slice(i)}"`;

    if (APOSTROPHES.has(c)) {
      return { ok: false, problems: [`an apostrophe is only used after a moraic n (n'), ${at}`] };
    }

    const v = readVowel(s, i);
    if (v) {
      out.push({ text: s.slice(i, i + v.length), kind: 'vowel', onset: '', vowel: v.vowel, long: v.long });
      i += v.length;
      continue;
    }

    // Moraic n: before a consonant other than y, at the end, or marked with n'.
    if (c === 'n') {
      const next = s[i + 1];
      if (next !== undefined && APOSTROPHES.has(next)) {
        out.push({ text: 'n', kind: 'moraic-n', onset: 'n', vowel: '', long: false });
        i += 2;
        continue;
      }
      if (next === undefined || (!vowelAt(s, i + 1) && next !== 'y')) {
        if (out.length === 0) return { ok: false, problems: [`a word cannot start with the moraic n, ${at}`] };
        out.push({ text: 'n', kind: 'moraic-n', onset: 'n', vowel: '', long: false });
        i += 1;
        continue;
      }
    }
    // Traditional Hepburn writes the moraic n as m before b, m and p.
    if (c === 'm' && out.length > 0 && (s[i + 1] === 'b' || s[i + 1] === 'm' || s[i + 1] === 'p')) {
      out.push({ text: 'm', kind: 'moraic-n', onset: 'm', vowel: '', long: false });
      i += 1;
      continue;
    }

    // Geminate consonant (small tsu): kk, ss(h), tt(s), pp, and t before ch.
    if (s.startsWith('cch', i)) return { ok: false, problems: [`"cch" is not Hepburn; write "tch", ${at}`] };
    if ((GEMINABLE.has(c) && s[i + 1] === c) || s.startsWith('tch', i)) {
      const prev = out[out.length - 1];
      if (!prev || prev.kind === 'geminate' || prev.kind === 'moraic-n') {
        return { ok: false, problems: [`a doubled consonant must follow a vowel, ${at}`] };
      }
      out.push({ text: c, kind: 'geminate', onset: c, vowel: '', long: false });
      i += 1;
      continue;
    }

    // Consonant + vowel, longest onset first.
    let matched = false;
    for (const len of [2, 1]) {
      const onset = s.slice(i, i + len);
      if (onset.length !== len) continue;
      const tri = s.slice(i, i + len + 1);
      if (len === 2 && /^[sztd]y$/.test(onset)) {
        const fix = OTHER_SYSTEM[tri];
        return { ok: false, problems: [fix ? `"${tri}" is Kunrei-shiki spelling; Hepburn writes "${fix}"` : `"${onset}" cannot start a Hepburn syllable, ${at}`] };
      }
      const allowed = ONSETS[onset];
      if (allowed === undefined) continue;
      const rv = readVowel(s, i + len);
      if (!rv) {
        if (len === 2) continue;
        return { ok: false, problems: [`"${c}" must be followed by a vowel, ${at}`] };
      }
      if (!allowed.includes(rv.vowel)) {
        const syl = onset + rv.vowel;
        const fix = OTHER_SYSTEM[syl];
        return {
          ok: false,
          problems: [fix !== undefined ? `"${syl}" is not Hepburn spelling; Hepburn writes "${fix}"` : `"${syl}" is not a syllable of the Hepburn table`],
        };
      }
      const kind: SyllableKind = len === 2 && onset.endsWith('y') ? 'palatal' : 'consonant-vowel';
      out.push({ text: s.slice(i, i + len + rv.length), kind, onset, vowel: rv.vowel, long: rv.long });
      i += len + rv.length;
      matched = true;
      break;
    }
    if (!matched) return { ok: false, problems: [`"${c}" cannot start a Hepburn syllable, ${at}`] };
  }
  return { ok: true, syllables: out };
}

const ELEMENT_SEPARATORS = /[\s\-‐‑–]+/u;

function splitStructured(word: string): { ok: true; elements: Syllable[][] } | { ok: false; problems: string[] } {
  const elements = word.trim().split(ELEMENT_SEPARATORS).filter((e) => e.length > 0);
  if (elements.length === 0) return { ok: false, problems: ['empty word'] };
  const result: Syllable[][] = [];
  for (const element of elements) {
    const r = splitElement(element);
    if (!r.ok) return r;
    result.push(r.syllables);
  }
  return { ok: true, elements: result };
}

/**
 * Splits a romanised word into Hepburn syllables so pronunciation guides and checks work per
 * syllable. A long vowel stays in its syllable ("tō", "kyou", "oo"); a moraic n is its own
 * syllable "n" (n' loses the apostrophe); the first letter of a doubled consonant (kk, ss, tt,
 * pp, the t of tch) is its own syllable. Hyphenated elements are split one after another.
 * Letters that Hepburn never uses (l, q, v, x, c outside ch), consonant clusters and spellings
 * from other systems (si, tu, hu…) make the word fail with a list of problems.
 */
export function splitHepburn(word: string): HepburnSplit {
  const r = splitStructured(word);
  if (!r.ok) return r;
  return { ok: true, syllables: r.elements.flat().map((s) => s.text) };
}

/** True when every word of the text is valid Hepburn, so it can get a generated guide. */
export function isHepburn(text: string): boolean {
  const words = text.trim().split(/\s+/).map(stripWordPunctuation).filter((w) => w.length > 0);
  return words.length > 0 && words.every((w) => splitStructured(w).ok);
}

const RESPELL_VOWEL: Record<string, string> = { a: 'ah', i: 'ee', u: 'oo', e: 'eh', o: 'oh' };

function respellSyllable(s: Syllable): string {
  // Hard g: "gh" before the front vowels so "gi" is not read as "jee".
  const onset = s.onset === 'g' && (s.vowel === 'i' || s.vowel === 'e') ? 'gh' : s.onset;
  return onset + RESPELL_VOWEL[s.vowel]!;
}

function stripWordPunctuation(word: string): string {
  return word.replace(/^[.,!]+|[.,!]+$/g, '');
}

/**
 * A plain-English sound-it-out guide for a romanised Japanese epithet, or null when any word is
 * not Hepburn (English epithets): the UI then shows the guide a moderator entered.
 *
 * Grovewalk's convention: Japanese has pitch accent, not stress, so no syllable is marked; all
 * are written in lower case with equal weight, syllables joined by hyphens and words by spaces.
 * Each vowel keeps one sound: a "ah" (father), e "eh" (bed), i "ee" (machine), o "oh" (more),
 * u "oo" (rule); a long vowel is written the same as a short one (the guide shows sounds, not
 * length). A moraic n and the first half of a doubled consonant close the syllable before them
 * ("gahk-koh"); g before i and e is written "gh" to keep it hard. A valid-Hepburn English word
 * (say "Rose") still gets a guide, which is why a moderator-entered guide always takes priority.
 */
export function respell(epithet: string): string | null {
  const words = epithet.trim().split(/\s+/).map(stripWordPunctuation).filter((w) => w.length > 0);
  if (words.length === 0) return null;
  const out: string[] = [];
  for (const word of words) {
    const r = splitStructured(word);
    if (!r.ok) return null;
    const groups: string[] = [];
    for (const syllable of r.elements.flat()) {
      if (syllable.kind === 'moraic-n' || syllable.kind === 'geminate') {
        // The onset field holds the consonant actually heard: n, m, or the doubled letter.
        if (groups.length > 0) groups[groups.length - 1] += syllable.onset;
        else groups.push(syllable.onset);
      } else {
        groups.push(respellSyllable(syllable));
      }
    }
    out.push(groups.join('-'));
  }
  return out.join(' ');
}
