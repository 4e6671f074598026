import { BadRequest } from '../../errors/http-error';

const languageNames = new Intl.DisplayNames(['en'], { type: 'language', fallback: 'none' });

/**
 * The canonical form of a well-formed BCP 47 tag ("en-gb" → "en-GB"), refused with 400 when its
 * primary language subtag is not a language ICU knows (the IANA subtag registry as CLDR carries
 * it), so a typo such as "xq" or "zz" never becomes a track nobody can find. The shared
 * schema has already checked the shape.
 */
export function canonicalLanguageTag(tag: string): { tag: string; languageName: string } {
  let canonical: string;
  try {
    [canonical = tag] = Intl.getCanonicalLocales(tag);
  } catch {
    throw unknownTag(tag);
  }
  const primary = canonical.split('-')[0] ?? '';
  const name = languageNames.of(primary);
  if (!name) throw unknownTag(tag);
  return { tag: canonical, languageName: name };
}

function unknownTag(tag: string): BadRequest {
  return new BadRequest('unknown_language', `"${tag}" is not a known language tag. Use a tag such as "en", "en-GB" or "ja".`, {
    lang: 'Unknown language: use a tag such as "en", "en-GB" or "ja".',
  });
}
