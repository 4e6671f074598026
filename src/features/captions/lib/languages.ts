import { langTagSchema } from '@shared/schemas/captions';

/** A language offered in the "New track" form: its BCP 47 tag, its English name, and the label viewers see. */
export interface LanguageChoice {
  tag: string;
  name: string;
  label: string;
}

/** A few common choices; any other well-formed BCP 47 tag can be typed in. */
export const LANGUAGE_CHOICES: LanguageChoice[] = [
  { tag: 'en', name: 'English', label: 'English' },
  { tag: 'en-GB', name: 'English (United Kingdom)', label: 'English (UK)' },
  { tag: 'en-US', name: 'English (United States)', label: 'English (US)' },
  { tag: 'de', name: 'German', label: 'Deutsch' },
  { tag: 'fr', name: 'French', label: 'Français' },
  { tag: 'es', name: 'Spanish', label: 'Español' },
  { tag: 'it', name: 'Italian', label: 'Italiano' },
  { tag: 'nl', name: 'Dutch', label: 'Nederlands' },
  { tag: 'ja', name: 'Japanese', label: '日本語' },
  { tag: 'ja-Latn', name: 'Japanese in Latin letters (rōmaji)', label: 'Nihongo (rōmaji)' },
];

/** The label to suggest for a tag: the listed one, else the tag itself until the author names it. */
export function suggestedLabel(tag: string): string {
  const t = tag.trim().toLowerCase();
  return LANGUAGE_CHOICES.find((c) => c.tag.toLowerCase() === t)?.label ?? '';
}

/** Checks a typed tag with the server's own rule (shared schema); the message when it fails. */
export function checkLanguageTag(tag: string): string | null {
  const result = langTagSchema.safeParse(tag);
  return result.success ? null : (result.error.issues[0]?.message ?? 'Use a language tag such as "en".');
}

/** Two tags name the same language when they match without regard to case (BCP 47 tags are case-insensitive). */
export function sameLanguage(a: string, b: string): boolean {
  return a.trim().toLowerCase() === b.trim().toLowerCase();
}
