/**
 * Cultivated plant names: the parts of a name, how Grovewalk prints them, and the writing checks
 * moderators see when they edit a cultivar record.
 *
 * Rules follow the ICNCP (9th edition, 2016) as summarised by the RHS "Recommended style for
 * printing plant names", the ICN for the botanical parts (Art. 20.1 genus capitalised, Rec. 60F.1
 * species epithet lower-case), and the ICNCP 2016 synthesis published by the International
 * Poplar Commission (FAO), "How to name a new cultivar": at most 30 characters with spaces and
 * demarcating quotation marks not counted (Art. 21.13), and only apostrophe, comma, up to two
 * exclamation marks, hyphen and full stop as punctuation (Art. 21.18; slash and backslash are
 * also allowed per the 2017 ICNCP summary for orchid hybrids).
 */
import { isHepburn } from './hepburn';

/** Ranks below species printed in roman between the species and its infraspecific epithet. */
export const INFRASPECIFIC_RANKS = ['subsp.', 'var.', 'f.'] as const;

/** One of the standard rank abbreviations; free text is allowed in input so it can be checked. */
export type InfraspecificRank = (typeof INFRASPECIFIC_RANKS)[number];

/** A cultivar name split into the fields a moderator edits; the epithet is stored without quotes. */
export interface NameParts {
  genus: string;
  species?: string;
  infraspecificRank?: InfraspecificRank | string;
  infraspecificEpithet?: string;
  group?: string;
  epithet?: string;
}

/** A run of text in one style, so the UI can italicise the botanical parts. */
export interface NameSegment {
  text: string;
  italic: boolean;
}

/** Which field a writing problem belongs to, so the form can show it in place. */
export type NameField = keyof NameParts;

/** Stable codes for the checks, so the UI and tests do not depend on message wording. */
export type NameProblemCode =
  | 'required'
  | 'markup'
  | 'genus-not-capitalised'
  | 'genus-not-one-word'
  | 'species-not-lower-case'
  | 'species-not-one-word'
  | 'rank-unknown'
  | 'rank-without-epithet'
  | 'epithet-without-rank'
  | 'infraspecific-not-lower-case'
  | 'group-quoted'
  | 'group-without-suffix'
  | 'group-not-capitalised'
  | 'double-quotes'
  | 'cv-with-quotes'
  | 'cv-prefix'
  | 'quotes-in-field'
  | 'lower-case-word'
  | 'too-long'
  | 'punctuation-not-allowed'
  | 'too-many-exclamation-marks'
  | 'forbidden-word';

/** One writing problem in plain English. */
export interface NameProblem {
  field: NameField;
  code: NameProblemCode;
  message: string;
}

/** ICNCP Art. 21.13 (2016), per the International Poplar Commission synthesis. */
export const EPITHET_MAX_CHARACTERS = 30;

/**
 * Words allowed to stay lower-case inside an epithet (never as its first word): the Japanese
 * particle "no" (kept lower-case in romanised names by the Library of Congress ALA-LC Japanese
 * romanisation table), and conjunctions, prepositions and articles of the languages common in
 * garden cultivar names (the ICNCP exempts conjunctions and prepositions, per the FAO
 * synthesis; articles are common practice).
 */
export const LOWER_CASE_PARTICLES: ReadonlySet<string> = new Set([
  'no',
  'and', 'or', 'of', 'the', 'a', 'an', 'in', 'on', 'at', 'by', 'for', 'to', 'with', 'from',
  'de', 'du', 'des', 'la', 'le', 'les', 'et', 'en', 'aux', 'au', 'sur',
  'van', 'von', 'der', 'den', 'het', 'op', 'ten', 'ter', 'und', 'zu',
  'di', 'da', 'del', 'della', 'y', 'e',
]);

/** Words the ICNCP does not allow in an epithet (per the 2017 ICNCP summary for orchid hybrids). */
const FORBIDDEN_WORDS = new Set([
  'cultivar', 'form', 'grex', 'group', 'hybrid', 'maintenance', 'mixture', 'selection', 'sport',
  'series', 'strain', 'variety', 'improved', 'transformed',
]);

const DOUBLE_QUOTES = /["“”„«»]/;
const SINGLE_QUOTES = /^['‘’`]|['‘’`]$/;
const MARKUP = /<\/?(?:i|em|b|strong)\b[^>]*>|^[*_]|[*_]$/i;
const CV = /(^|\s)cv\.?(\s|$)/i;
const ALLOWED_EPITHET_CHAR = /[\p{L}\p{M}\p{N}\s'’,!.\-‐/\\]/u;

function clean(value: string | undefined): string {
  return (value ?? '').trim().replace(/\s+/g, ' ');
}

function present(value: string | undefined): value is string {
  return clean(value).length > 0;
}

/**
 * Characters counted against the 30-character limit: everything but spaces and the demarcating
 * quotation marks around the epithet (an apostrophe inside it counts).
 */
export function countEpithetCharacters(epithet: string): number {
  const inner = epithet.normalize('NFC').trim().replace(/^['‘’"“”]+|['‘’"“”]+$/g, '');
  return [...inner].filter((ch) => !/\s/.test(ch)).length;
}

/**
 * The printed segments of a name, italic where botanical convention wants it: genus, species and
 * infraspecific epithet italic; rank abbreviation, Group and cultivar epithet roman; the epithet
 * in single quotes; the Group in brackets when an epithet follows it. Adjacent runs of the same
 * style are merged so the UI renders as few spans as possible.
 */
export function formatNameParts(parts: NameParts): NameSegment[] {
  const pieces: NameSegment[] = [];
  const genus = clean(parts.genus);
  if (genus) pieces.push({ text: genus, italic: true });
  if (present(parts.species)) pieces.push({ text: clean(parts.species), italic: true });
  if (present(parts.infraspecificEpithet)) {
    if (present(parts.infraspecificRank)) pieces.push({ text: clean(parts.infraspecificRank), italic: false });
    pieces.push({ text: clean(parts.infraspecificEpithet), italic: true });
  }
  const hasEpithet = present(parts.epithet);
  if (present(parts.group)) {
    const group = clean(parts.group).replace(/^\((.*)\)$/, '$1').trim();
    pieces.push({ text: hasEpithet ? `(${group})` : group, italic: false });
  }
  if (hasEpithet) pieces.push({ text: `'${clean(parts.epithet)}'`, italic: false });

  const merged: NameSegment[] = [];
  pieces.forEach((piece, i) => {
    if (i > 0) {
      // A space between two italic words is italic too, so "Acer palmatum" stays one run.
      const spaceItalic = pieces[i - 1]!.italic && piece.italic;
      append(merged, { text: ' ', italic: spaceItalic });
    }
    append(merged, piece);
  });
  return merged;
}

function append(segments: NameSegment[], segment: NameSegment): void {
  const last = segments[segments.length - 1];
  if (last && last.italic === segment.italic) last.text += segment.text;
  else segments.push({ ...segment });
}

/** The name as plain text, e.g. for page titles, search and exports. */
export function formatAcceptedName(parts: NameParts): string {
  return formatNameParts(parts).map((s) => s.text).join('');
}

function problem(field: NameField, code: NameProblemCode, message: string): NameProblem {
  return { field, code, message };
}

function markupProblem(field: NameField, value: string): NameProblem | null {
  return MARKUP.test(value)
    ? problem(field, 'markup', 'Remove the formatting marks (*, _ or HTML tags): Grovewalk sets italics itself.')
    : null;
}

function checkGenus(genus: string, out: NameProblem[]): void {
  if (!genus) {
    out.push(problem('genus', 'required', 'Enter the genus, for example Acer.'));
    return;
  }
  const markup = markupProblem('genus', genus);
  if (markup) out.push(markup);
  const bare = genus.replace(/^[*_]+|[*_]+$/g, '').replace(/^×\s?/, '');
  if (/\s/.test(bare)) {
    out.push(problem('genus', 'genus-not-one-word', 'The genus is a single word; put the species in its own field.'));
  }
  const first = bare.charAt(0);
  if (first && first !== first.toUpperCase()) {
    const fixed = first.toUpperCase() + bare.slice(1);
    out.push(problem('genus', 'genus-not-capitalised', `Start the genus with a capital letter: ${fixed}, not ${bare}.`));
  }
}

function checkLowerCaseBotanical(field: 'species' | 'infraspecificEpithet', value: string, out: NameProblem[]): void {
  const markup = markupProblem(field, value);
  if (markup) out.push(markup);
  const bare = value.replace(/^[*_]+|[*_]+$/g, '').replace(/^×\s?/, '');
  if (field === 'species' && /\s/.test(bare)) {
    out.push(problem('species', 'species-not-one-word', 'The species epithet is a single word.'));
  }
  if (bare !== bare.toLowerCase()) {
    const label = field === 'species' ? 'species epithet' : 'infraspecific epithet';
    out.push(
      problem(
        field,
        field === 'species' ? 'species-not-lower-case' : 'infraspecific-not-lower-case',
        `Write the ${label} in lower case: ${bare.toLowerCase()}, not ${bare}.`,
      ),
    );
  }
}

function checkGroup(group: string, out: NameProblem[]): void {
  const markup = markupProblem('group', group);
  if (markup) out.push(markup);
  if (DOUBLE_QUOTES.test(group) || SINGLE_QUOTES.test(group)) {
    out.push(problem('group', 'group-quoted', 'A Group name is not put in quotation marks.'));
  }
  const words = group
    .replace(/^[(\[]|[)\]]$/g, '')
    .replace(/^['‘’`"“”„«»]+|['‘’`"“”„«»]+$/g, '')
    .trim()
    .split(' ');
  const last = words[words.length - 1] ?? '';
  if (last.toLowerCase() !== 'group') {
    out.push(problem('group', 'group-without-suffix', 'End the Group name with the word "Group", as in "Dissectum Group".'));
  }
  const lower = words.filter((w, i) => /^\p{Ll}/u.test(w) && !(i > 0 && i < words.length - 1 && LOWER_CASE_PARTICLES.has(w)));
  if (lower.length > 0) {
    out.push(
      problem('group', 'group-not-capitalised', `Capitalise each word of the Group name, including "Group": ${lower.map((w) => `"${w}"`).join(', ')}.`),
    );
  }
}

function checkEpithet(raw: string, out: NameProblem[]): void {
  const hasDouble = DOUBLE_QUOTES.test(raw);
  const hasCv = CV.test(raw);
  const withoutCv = raw.replace(CV, ' ').trim();
  const hasSingle = SINGLE_QUOTES.test(withoutCv);

  if (hasCv && (hasSingle || hasDouble)) {
    out.push(problem('epithet', 'cv-with-quotes', 'Drop "cv.": it is not used together with quotation marks around an epithet.'));
  } else if (hasCv) {
    out.push(problem('epithet', 'cv-prefix', 'Leave out "cv.": enter only the epithet, which Grovewalk prints in single quotes.'));
  }
  if (hasDouble) {
    out.push(
      problem('epithet', 'double-quotes', 'Epithets take single quotation marks, never double ones; enter the epithet without quotes and Grovewalk adds the single ones.'),
    );
  } else if (hasSingle && !hasCv) {
    out.push(problem('epithet', 'quotes-in-field', 'Leave out the quotation marks: Grovewalk adds single quotes around the epithet when it prints the name.'));
  }
  const markup = markupProblem('epithet', raw);
  if (markup) out.push(markup);

  // The remaining checks look at the epithet itself.
  const epithet = withoutCv.replace(/^['‘’`"“”„«»*_]+|['‘’`"“”„«»*_]+$/g, '').replace(/<[^>]*>/g, '').trim();
  if (!epithet) return;

  const words = epithet.split(' ');
  const lowerWords: string[] = [];
  words.forEach((word, i) => {
    const head = word.split(/[-‐]/)[0] ?? '';
    if (!/^\p{Ll}/u.test(head)) return;
    if (i > 0 && LOWER_CASE_PARTICLES.has(head)) return;
    lowerWords.push(word);
  });
  if (lowerWords.length > 0) {
    out.push(
      problem(
        'epithet',
        'lower-case-word',
        `Start ${lowerWords.map((w) => `"${w}"`).join(', ')} with a capital letter: each word of an epithet is capitalised, except particles such as "no", "de" or "van" after the first word and the part after a hyphen.`,
      ),
    );
  }

  const count = countEpithetCharacters(epithet);
  if (count > EPITHET_MAX_CHARACTERS) {
    out.push(
      problem(
        'epithet',
        'too-long',
        `The epithet has ${count} characters, not counting spaces and quotation marks; the limit is ${EPITHET_MAX_CHARACTERS}.`,
      ),
    );
  }

  const badChars = [...new Set([...epithet].filter((ch) => !ALLOWED_EPITHET_CHAR.test(ch)))];
  if (badChars.length > 0) {
    out.push(
      problem(
        'epithet',
        'punctuation-not-allowed',
        `Remove ${badChars.map((c) => `"${c}"`).join(', ')}: an epithet may only use apostrophes, commas, hyphens, full stops, slashes and up to two exclamation marks.`,
      ),
    );
  }
  if ((epithet.match(/!/g) ?? []).length > 2) {
    out.push(problem('epithet', 'too-many-exclamation-marks', 'Use at most two exclamation marks in an epithet.'));
  }

  const forbidden = words.map((w) => w.toLowerCase().replace(/[^\p{L}]/gu, '')).filter((w) => FORBIDDEN_WORDS.has(w));
  if (forbidden.length > 0) {
    const hint = forbidden.includes('group') ? ' A cultivar Group goes in the Group field.' : '';
    out.push(
      problem('epithet', 'forbidden-word', `An epithet may not contain the word ${forbidden.map((w) => `"${w}"`).join(', ')}.${hint}`),
    );
  }
}

/**
 * Every writing problem in a name, each tied to its field with a plain-English message, so
 * moderators fix names before they spread to captions and the glossary. An empty list means the
 * name follows the conventions Grovewalk checks (not that the name is registered).
 */
export function validateNameParts(parts: NameParts): NameProblem[] {
  const out: NameProblem[] = [];
  checkGenus(clean(parts.genus), out);
  if (present(parts.species)) checkLowerCaseBotanical('species', clean(parts.species), out);

  const rank = clean(parts.infraspecificRank);
  const infra = clean(parts.infraspecificEpithet);
  if (rank && !(INFRASPECIFIC_RANKS as readonly string[]).includes(rank)) {
    const hint = /^ssp\.?$/i.test(rank) ? ' Write "subsp.", not "ssp." (easily confused with "sp.").' : '';
    out.push(problem('infraspecificRank', 'rank-unknown', `Use one of the rank abbreviations ${INFRASPECIFIC_RANKS.join(', ')}.${hint}`));
  }
  if (rank && !infra) {
    out.push(problem('infraspecificEpithet', 'rank-without-epithet', `Enter the epithet that follows "${rank}", or clear the rank.`));
  }
  if (infra) {
    if (!rank) out.push(problem('infraspecificRank', 'epithet-without-rank', 'Choose the rank (subsp., var. or f.) for the infraspecific epithet.'));
    checkLowerCaseBotanical('infraspecificEpithet', infra, out);
  }

  if (present(parts.group)) checkGroup(clean(parts.group), out);
  if (present(parts.epithet)) checkEpithet(clean(parts.epithet), out);
  return out;
}

const QUOTE_CHARS = /["“”„«»]/g;
const EDGE_QUOTES = /^['‘’`]+|['‘’`]+$/g;

function capitaliseFirst(word: string): string {
  const [first = '', ...rest] = [...word];
  return first.toUpperCase() + rest.join('');
}

/**
 * Tidies a typed epithet into the form Grovewalk stores: drops "cv.", quotation marks and
 * formatting marks, collapses spaces, and capitalises each word (particles after the first word
 * excepted). A romanised Japanese word (valid Hepburn) follows the 'Word-word' convention: the
 * first element capitalised, the elements after a hyphen lower-case. Other hyphenated words keep
 * the case typed after the hyphen. It cannot fix length or forbidden words; validate afterwards.
 */
export function normaliseEpithetInput(input: string): string {
  let s = input.normalize('NFC').replace(/<[^>]*>/g, ' ');
  s = s.replace(CV, ' ').replace(QUOTE_CHARS, ' ').trim();
  s = s.replace(/^[*_]+|[*_]+$/g, '').trim().replace(EDGE_QUOTES, '').trim();
  s = s.replace(/\s+/g, ' ').replace(/\s*([-‐])\s*/g, '$1');
  if (!s) return '';

  const words = s.split(' ');
  const allHepburn = isHepburn(s);
  return words
    .map((word, i) => {
      const bare = word.replace(/[.,!]+$/, '');
      if (i > 0 && LOWER_CASE_PARTICLES.has(bare.toLowerCase()) && bare === bare.toLowerCase()) return word;
      // In a romanised Japanese epithet the particle "no" is lower-case (ALA-LC Japanese table).
      if (i > 0 && allHepburn && bare.toLowerCase() === 'no') return word.toLowerCase();
      const elements = word.split(/([-‐])/);
      if (isHepburn(bare)) {
        return elements.map((e, j) => (j === 0 ? capitaliseFirst(e.toLowerCase()) : e.toLowerCase())).join('');
      }
      return elements.map((e, j) => (j === 0 ? capitaliseFirst(e) : e)).join('');
    })
    .join(' ');
}
