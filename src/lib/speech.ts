/**
 * Choosing how the browser's speech synthesis says a cultivar name. Pure, so the choice can be
 * tested without a browser; the "Hear it" button feeds it the voices the browser lists.
 */

/** The parts of a SpeechSynthesisVoice the choice needs. */
export interface VoiceLike {
  name: string;
  lang: string;
  default?: boolean;
}

/** What to say, in which language, with which voice, and a plain note about it for the reader. */
export interface SpeechPlan<V extends VoiceLike = VoiceLike> {
  text: string;
  /** BCP 47 tag for the utterance; undefined leaves the browser's default language. */
  lang: string | undefined;
  voice: V | null;
  note: string;
}

/** Browser language tags come as "ja-JP", "ja_JP" or "JA-jp"; compare them in one form. */
export function normaliseLang(lang: string): string {
  return lang.trim().replace(/_/g, '-').toLowerCase();
}

/** A Japanese voice when the device has one: ja-JP first, then any other "ja" voice. */
export function japaneseVoice<V extends VoiceLike>(voices: readonly V[]): V | null {
  const ja = voices.filter((v) => normaliseLang(v.lang) === 'ja' || normaliseLang(v.lang).startsWith('ja-'));
  return ja.find((v) => normaliseLang(v.lang) === 'ja-jp') ?? ja[0] ?? null;
}

/**
 * Romanised Japanese names are best read by a Japanese voice (lang ja-JP), with the hyphens
 * between elements read as short pauses. Without such a voice the default voice reads the
 * plain-English respelling when there is one, since it gets the vowels closer than the romanised
 * spelling read as English. Other names are read as written by the default voice.
 */
export function planSpeech<V extends VoiceLike>(name: { epithet: string; hepburn: boolean; respelling: string | null }, voices: readonly V[]): SpeechPlan<V> {
  if (name.hepburn) {
    const voice = japaneseVoice(voices);
    if (voice) {
      return { text: name.epithet.replace(/[-‐‑]/g, ' '), lang: 'ja-JP', voice, note: 'Read by a Japanese voice on this device.' };
    }
    return {
      text: name.respelling ?? name.epithet,
      lang: undefined,
      voice: null,
      note: 'This device has no Japanese voice, so its default voice reads the guide; the vowels may still sound English.',
    };
  }
  return { text: name.epithet, lang: undefined, voice: null, note: 'Read by the default voice on this device.' };
}
