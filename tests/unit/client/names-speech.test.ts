import { describe, expect, it } from 'vitest';
import { japaneseVoice, normaliseLang, planSpeech } from '@/lib/speech';

// Voices as browsers list them (name and BCP 47 tag); the names are invented for the test.
const english = { name: 'Reader One', lang: 'en-GB', default: true };
const japanese = { name: 'Reader Two', lang: 'ja-JP' };
const japaneseUnderscore = { name: 'Reader Three', lang: 'ja_JP' };
const japaneseBare = { name: 'Reader Four', lang: 'ja' };

describe('language tags', () => {
  it('compares tags without regard to case, as RFC 5646 §2.1.1 says tags are case-insensitive', () => {
    expect(normaliseLang('JA-jp')).toBe(normaliseLang('ja-JP'));
    // Some platforms report "ja_JP" (POSIX locale form); it names the same language and region.
    expect(normaliseLang('ja_JP')).toBe('ja-jp');
  });

  it('prefers a ja-JP voice, then any Japanese one (ISO 639-1 "ja"), and finds none among English voices', () => {
    expect(japaneseVoice([english, japaneseBare, japanese])).toBe(japanese);
    expect(japaneseVoice([english, japaneseUnderscore])).toBe(japaneseUnderscore);
    expect(japaneseVoice([english, japaneseBare])).toBe(japaneseBare);
    expect(japaneseVoice([english])).toBeNull();
    // "jam" (Jamaican Creole, ISO 639-3) must not pass for Japanese.
    expect(japaneseVoice([{ name: 'x', lang: 'jam-JM' }])).toBeNull();
  });
});

describe('what "Hear it" says (fictional demo names)', () => {
  it('reads a romanised Japanese name with a Japanese voice in ja-JP, hyphens as pauses', () => {
    const plan = planSpeech({ epithet: 'Sora-no-hane', hepburn: true, respelling: 'soh-rah noh hah-neh' }, [english, japanese]);
    expect(plan.lang).toBe('ja-JP');
    expect(plan.voice).toBe(japanese);
    expect(plan.text).toBe('Sora no hane');
  });

  it('falls back to the default voice reading the respelling when no Japanese voice exists, and says so', () => {
    const plan = planSpeech({ epithet: 'Sora-no-hane', hepburn: true, respelling: 'soh-rah noh hah-neh' }, [english]);
    expect(plan.lang).toBeUndefined();
    expect(plan.voice).toBeNull();
    expect(plan.text).toBe('soh-rah noh hah-neh');
    expect(plan.note).toMatch(/no Japanese voice/);
  });

  it('reads an English name as written with the default voice', () => {
    const plan = planSpeech({ epithet: 'Ember Lantern', hepburn: false, respelling: null }, [english, japanese]);
    expect(plan).toMatchObject({ text: 'Ember Lantern', lang: undefined, voice: null });
  });
});
