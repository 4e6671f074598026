import { describe, expect, it } from 'vitest';
import { parseStartTime } from '@/features/tours/lib/start-time';
import {
  absoluteUrl,
  CAPTIONS_PREF_KEY,
  momentPath,
  readCaptionsOn,
  stopName,
  stopPath,
  watchDescription,
  watchTitle,
  writeCaptionsOn,
  type PrefStorage,
} from '@/features/tours/lib/watch-links';

// Deep links carry ?t= in seconds as the W3C Media Fragments URI 1.0 temporal dimension (npt)
// writes them, read back by the page's own ?t= parser; addresses are resolved with the WHATWG URL
// standard (the URL class). Tours and stops here are invented (fictional Fernhollow Maple Circle).

class MapStorage implements PrefStorage {
  readonly map = new Map<string, string>();
  getItem(key: string) {
    return this.map.get(key) ?? null;
  }
  setItem(key: string, value: string) {
    this.map.set(key, value);
  }
}

describe('deep links', () => {
  it('a stop’s own address, with or without a moment inside it', () => {
    expect(stopPath(7, 31)).toBe('/tours/7/stops/31');
    expect(stopPath(7, 31, 10_250)).toBe('/tours/7/stops/31?t=10.2');
    expect(parseStartTime(new URL(stopPath(7, 31, 10_250), 'http://x.test').searchParams.get('t'))).toBeCloseTo(10.2, 6);
  });

  it('a moment link rounds down to whole seconds and round-trips through ?t= (npt seconds)', () => {
    for (const sec of [1, 1.99, 59.5, 61.2, 3599.9, 3600.4]) {
      const url = new URL(momentPath(3, sec), 'http://x.test');
      const back = parseStartTime(url.searchParams.get('t'));
      expect(back).toBe(Math.floor(sec));
      expect(sec - back!).toBeLessThan(1);
      expect(sec - back!).toBeGreaterThanOrEqual(0);
    }
    expect(momentPath(3, 0.6)).toBe('/tours/3');
    expect(momentPath(3, Number.NaN)).toBe('/tours/3');
  });

  it('makes a full address for sharing (WHATWG URL)', () => {
    expect(absoluteUrl('http://127.0.0.1:5173', '/tours/3/stops/9')).toBe('http://127.0.0.1:5173/tours/3/stops/9');
  });
});

describe('page title and description', () => {
  const stop = { number: 2, name: "Acer palmatum (Dissectum Group) 'Sora-no-hane'", title: 'Sora-no-hane', startMs: 10_000 };

  it('names the stop first, then the tour', () => {
    expect(watchTitle('Autumn colour on the terrace', stop)).toBe("Stop 2: Acer palmatum (Dissectum Group) 'Sora-no-hane' – Autumn colour on the terrace");
    expect(watchTitle('Autumn colour on the terrace', null)).toBe('Autumn colour on the terrace');
    expect(stopName({ number: 4, name: null, title: '' })).toBe('Stop 4 (unidentified tree)');
    expect(stopName({ number: 4, name: null, title: 'Unlabelled tree 4' })).toBe('Unlabelled tree 4 (unidentified tree)');
  });

  it('describes the tour and the stop within the length limit, cut at a word', () => {
    const text = watchDescription({ tourTitle: 'Autumn colour on the terrace', garden: 'Pellworth Sunken Garden (fictional)', author: 'Ada Pellworth', stop, stopCount: 3 });
    expect(text).toContain('Stop 2 at 0:10');
    expect(text).toContain('Sora-no-hane');
    expect(text).toContain('3 trees');
    const long = watchDescription({ tourTitle: 'A very long title '.repeat(20), garden: '', author: 'Ada', stop: null, stopCount: 1 }, 120);
    expect(long.length).toBeLessThanOrEqual(120);
    expect(long.endsWith('…')).toBe(true);
    expect(long).not.toMatch(/\s…$/);
  });
});

describe('the captions choice', () => {
  it('is on until the viewer turns captions off, and remembered', () => {
    const storage = new MapStorage();
    expect(readCaptionsOn(storage)).toBe(true);
    writeCaptionsOn(storage, false);
    expect(storage.map.get(CAPTIONS_PREF_KEY)).toBe('off');
    expect(readCaptionsOn(storage)).toBe(false);
    writeCaptionsOn(storage, true);
    expect(readCaptionsOn(storage)).toBe(true);
  });

  it('falls back to captions on when storage is missing or refuses', () => {
    const refusing: PrefStorage = {
      getItem() {
        throw new Error('denied');
      },
      setItem() {
        throw new Error('denied');
      },
    };
    expect(readCaptionsOn(null)).toBe(true);
    expect(readCaptionsOn(refusing)).toBe(true);
    expect(() => writeCaptionsOn(refusing, false)).not.toThrow();
  });
});
