/**
 * The safety text that goes with growing advice. Grovewalk gives general advice only: every
 * caution ends by deferring to local codes, product labels and licensed arborists.
 */

/** Shown next to any growing advice (tree card, record page, finder), whatever the notes say. */
export const CARE_CAUTION =
  'Take care with sharp tools, ladders and heavy pots; find out where buried cables and pipes run before you dig; ' +
  'use any chemical only as its label directs. Follow local codes, and ask a licensed arborist for work at height or on large trees.';

interface CareTopic {
  /** Words (lower case, whole words or word starts) that show the notes give this kind of advice. */
  words: RegExp;
  caution: string;
}

// Keyword lists are common practice for spotting care advice, no source; each caution is the
// usual short one for that kind of work.
const TOPICS: readonly CareTopic[] = [
  {
    words: /\b(prun\w*|cut\w*|trim\w*|saw\w*|secateurs?|shears|lopp\w*|pinch\w*)\b/,
    caution: 'Pruning: keep blades sharp and clean, cut away from your body and wear gloves and eye protection.',
  },
  {
    words: /\b(ladders?|at height|canopy|climb\w*|tall)\b/,
    caution: 'Height: use a stable ladder on level ground with someone holding it; leave work at height to a licensed arborist.',
  },
  {
    words: /\b(repot\w*|pots?|potted|containers?|tubs?|planters?|lift\w*)\b/,
    caution: 'Containers: a large pot of wet soil is heavy; lift with a helper or a trolley and bend your knees.',
  },
  {
    words: /\b(dig\w*|bur(y|ied|ying)|trench\w*|plant(ing)? (it )?out|planting hole|transplant\w*)\b/,
    caution: 'Digging: ask your local utility-locating service where buried cables and pipes run before you dig.',
  },
  {
    words: /\b(spray\w*|pesticides?|insecticides?|fungicides?|herbicides?|weedkillers?|fertili[sz]\w*|feed\w*|chemicals?|lime sulphur|oil)\b/,
    caution: 'Chemicals: use them only as the product label directs, with the protection it names, away from children, pets and water.',
  },
  {
    words: /\b(toxic|poison\w*|livestock|horses?|pets?|invasive|self-seed\w*|seedlings)\b/,
    caution: 'Some plants are toxic to animals or invasive in some regions: check with your local extension service or plant authority.',
  },
];

/** The notes as lower-case words: markup dropped, the common entities decoded. */
function plainText(html: string): string {
  return html
    .replace(/<[^>]*>/g, ' ')
    .replace(/&nbsp;/g, ' ')
    .replace(/&amp;/g, '&')
    .replace(/\s+/g, ' ')
    .toLowerCase();
}

/**
 * The safety note for a record's notes: null when they give no care advice that needs one,
 * otherwise the cautions for the kinds of work they describe followed by the general caution.
 */
export function careNoteFor(notesHtml: string): string | null {
  const text = plainText(notesHtml);
  if (!text.trim()) return null;
  const cautions = TOPICS.filter((t) => t.words.test(text)).map((t) => t.caution);
  if (cautions.length === 0) return null;
  return [...cautions, CARE_CAUTION].join(' ');
}
