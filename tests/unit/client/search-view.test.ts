import { describe, expect, it } from 'vitest';
import type { MatchReason } from '@shared/schemas/search';
import { momentHref, reasonView, searchHref, searchPageCount, searchParamsOf } from '@/features/search/lib/search-view';
import { parseStartTime } from '@/features/tours/lib/start-time';
import { markedSegments } from '@/lib/text-marks';
import { sheetTileStyle } from '@/lib/thumb-style';

// Sources: W3C Media Fragments URI 1.0 (npt seconds in ?t=, read back by the page's own parser);
// ECMA-262 string indices (UTF-16 code units) for highlight offsets; CSS Backgrounds and Borders
// Level 3 §3.6–3.9 for how percentage background positions and sizes place a sprite tile.
// Names and tours are invented (fictional Fernhollow Maple Circle; 'Sora-no-hane' is not a real cultivar).

describe('momentHref', () => {
  it('opens the stop’s own address at the cue, never after the words begin', () => {
    for (const startMs of [10_200, 10_299, 59_999, 3_600_050, 0]) {
      const href = momentHref({ tourId: 3, startMs, stop: { id: 8, title: 'x', startMs: 10_000, endMs: 18_000, cultivar: null } });
      const url = new URL(href, 'http://x.test');
      expect(url.pathname).toBe('/tours/3/stops/8');
      const t = parseStartTime(url.searchParams.get('t'))!;
      expect(t).toBeLessThanOrEqual(startMs / 1000);
      expect(startMs / 1000 - t).toBeLessThan(0.1 + 1e-9);
    }
  });

  it('opens the tour at the moment when no stop covers the cue', () => {
    expect(momentHref({ tourId: 3, startMs: 1_500, stop: null })).toBe('/tours/3?t=1.5');
  });
});

describe('reasonView', () => {
  const name = (how: 'exact' | 'variant' | 'prefix' | 'contains' | 'fuzzy' | 'phonetic'): MatchReason => ({ kind: 'name', how, score: 0.9, matched: 'Sora no hane', heard: 'sora no hani' });

  it('offers a close spelling or sound-alike as a correction', () => {
    expect(reasonView(name('fuzzy'), 'Sora-no-hane')).toEqual({ text: 'Did you mean ‘Sora-no-hane’?', suggestion: true });
    expect(reasonView(name('phonetic'), 'Sora-no-hane').suggestion).toBe(true);
  });

  it('says plainly how other names matched', () => {
    expect(reasonView(name('exact'), 'Sora-no-hane').text).toBe('Name matches');
    expect(reasonView(name('variant'), 'Sora-no-hane').text).toBe('Also written “Sora no hane”');
    expect(reasonView(name('prefix'), 'Sora-no-hane').text).toBe('Name starts with “sora no hani”');
    expect(reasonView(name('contains'), 'Sora-no-hane').suggestion).toBe(false);
  });

  it('names a trait reason with its seasons', () => {
    expect(reasonView({ kind: 'trait', trait: 'habit', value: 'weeping', label: 'Weeping habit' }, 'x').text).toBe('Weeping habit');
    expect(reasonView({ kind: 'trait', trait: 'colours', value: 'red', label: 'Red leaves', seasons: ['spring', 'autumn'] }, 'x').text).toBe('Red leaves in spring and autumn');
  });
});

describe('search addresses and pages', () => {
  it('reads and writes the search in the address', () => {
    expect(searchParamsOf(new URLSearchParams('q=%20sora%20no%20hani%20&page=2'))).toEqual({ q: 'sora no hani', page: 2 });
    expect(searchParamsOf(new URLSearchParams('q=x&page=-3')).page).toBe(1);
    expect(searchParamsOf(new URLSearchParams('q=x&page=1.5')).page).toBe(1);
    expect(searchHref('coral bark')).toBe('/search?q=coral+bark');
    expect(searchHref('coral bark', 3)).toBe('/search?q=coral+bark&page=3');
  });

  it('counts pages by the longest group', () => {
    const data = { pageSizes: { cultivars: 10, tours: 10, moments: 20 }, cultivars: { items: [], total: 3 }, tours: { items: [], total: 0 }, moments: { items: [], total: 41, capped: false } };
    expect(searchPageCount(data)).toBe(3);
    expect(searchPageCount({ ...data, cultivars: { items: [], total: 0 }, moments: { items: [], total: 0, capped: false } })).toBe(1);
  });
});

describe('markedSegments (ECMA-262 UTF-16 offsets)', () => {
  it('marks the spans and always joins back into the text', () => {
    const text = 'And back to Sora no hani, now scarlet.';
    const segs = markedSegments(text, [{ start: 12, end: 24 }]);
    expect(segs).toEqual([
      { text: 'And back to ', marked: false },
      { text: 'Sora no hani', marked: true },
      { text: ', now scarlet.', marked: false },
    ]);
    expect(segs.map((s) => s.text).join('')).toBe(text);
  });

  it('joins overlapping spans and clamps bad ones', () => {
    const text = 'coral bark and coral twigs';
    const segs = markedSegments(text, [{ start: 6, end: 10 }, { start: 0, end: 7 }, { start: 20, end: 999 }, { start: 5, end: 5 }, { start: -4, end: 0 }]);
    expect(segs.filter((s) => s.marked).map((s) => s.text)).toEqual(['coral bark', ' twigs']);
    expect(segs.map((s) => s.text).join('')).toBe(text);
  });

  it('counts characters outside the Basic Multilingual Plane as two code units', () => {
    const text = '🍁 Sora 🍁';
    // "🍁" is U+1F341, two UTF-16 code units, so "Sora" runs from 3 to 7.
    expect(markedSegments(text, [{ start: 3, end: 7 }]).find((s) => s.marked)?.text).toBe('Sora');
  });
});

describe('sheetTileStyle (CSS Backgrounds and Borders Level 3)', () => {
  const tile = { url: '/media/tours/3/thumbs-0.jpg', sheetWidth: 1600, sheetHeight: 900, x: 480, y: 180, w: 160, h: 90 };

  it('scales the sheet so one tile fills the box, and puts that tile at the box’s corner', () => {
    const style = sheetTileStyle(tile);
    expect(style.aspectRatio).toBe('160 / 90');
    const [sizeX, sizeY] = String(style.backgroundSize).split(' ').map((v) => parseFloat(v) / 100);
    const [posX, posY] = String(style.backgroundPosition).split(' ').map((v) => parseFloat(v) / 100);
    for (const boxWidth of [120, 176, 320]) {
      const boxHeight = (boxWidth * 90) / 160;
      const imageW = boxWidth * sizeX!;
      const imageH = boxHeight * sizeY!;
      // §3.6: a percentage p offsets the image by (box − image) × p.
      const offsetX = (boxWidth - imageW) * posX!;
      const offsetY = (boxHeight - imageH) * posY!;
      const scale = boxWidth / tile.w;
      expect(offsetX).toBeCloseTo(-tile.x * scale, 2); // within 0.005 px
      expect(offsetY).toBeCloseTo(-tile.y * scale, 2);
      expect(imageW).toBeCloseTo(tile.sheetWidth * scale, 2);
    }
  });

  it('handles a sheet that is a single tile, and quotes the address safely', () => {
    const one = sheetTileStyle({ ...tile, sheetWidth: 160, sheetHeight: 90, x: 0, y: 0 });
    expect(one.backgroundPosition).toBe('0% 0%');
    expect(sheetTileStyle({ ...tile, url: '/a"b\\c' }).backgroundImage).toBe('url("/a\\"b\\\\c")');
  });
});

describe('markedSegments with bridgeSpaces', () => {
  it('reads words matched one by one as one phrase when only spaces part them', () => {
    const text = 'And back to Sora no hani, now scarlet.';
    const spans = [
      { start: 12, end: 16 },
      { start: 17, end: 19 },
      { start: 20, end: 24 },
    ];
    expect(markedSegments(text, spans, { bridgeSpaces: true }).filter((s) => s.marked).map((s) => s.text)).toEqual(['Sora no hani']);
    expect(markedSegments(text, spans).filter((s) => s.marked)).toHaveLength(3);
    // Punctuation between matches is not bridged.
    expect(markedSegments('sora, hani', [{ start: 0, end: 4 }, { start: 6, end: 10 }], { bridgeSpaces: true }).filter((s) => s.marked)).toHaveLength(2);
  });
});
