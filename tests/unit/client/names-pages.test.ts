import { describe, expect, it } from 'vitest';
import { thumbTileAt } from '@shared/thumb-tile';
import { apiQueryFromFilters, filtersFromParams, isFiltered, paramsFromFilters } from '@/features/cultivars/lib/index-params';
import { letterBar, letterParam, matchNote, spokenSummary, variantsText } from '@/features/glossary/lib/glossary-words';

describe('cultivar index address', () => {
  it('round-trips every filter and leaves defaults out', () => {
    const params = new URLSearchParams('q=sora&group=Dissectum&leafForm=dissectum&habit=weeping&container=good&status=proposed&order=updated-desc&page=3');
    const f = filtersFromParams(params, true);
    expect(paramsFromFilters(f).toString()).toBe(params.toString());
    expect(apiQueryFromFilters(f)).toEqual({ page: 3, pageSize: 20, sort: 'updated', dir: 'desc', q: 'sora', group: 'Dissectum', leafForm: 'dissectum', habit: 'weeping', container: 'good', status: 'proposed' });
    expect(paramsFromFilters(filtersFromParams(new URLSearchParams(), false)).toString()).toBe('');
  });

  it('drops unknown values one by one, and the status filter for non-moderators', () => {
    const f = filtersFromParams(new URLSearchParams('leafForm=feathery&habit=weeping&order=random&page=-2&status=retired'), false);
    expect(f).toMatchObject({ leafForm: '', habit: 'weeping', order: 'name-asc', page: 1, status: 'approved' });
    expect(isFiltered(f)).toBe(true);
    expect(isFiltered(filtersFromParams(new URLSearchParams('page=2'), false))).toBe(false);
  });
});

describe('tiles of tour moments', () => {
  it('finds the tile position that ffmpeg\'s tile filter gives (libavfilter vf_tile.c: x = (n mod columns) × w, y = floor(n / columns) × h)', () => {
    const strip = { everySec: 2, tileWidth: 160, tileHeight: 90, columns: 5, rows: 5, count: 40, sheets: ['/media/sheet-0.jpg', '/media/sheet-1.jpg'] };
    // 16 s at one picture every 2 s is picture 8: column 3, row 1 of the first sheet.
    expect(thumbTileAt(strip, 16_000)).toMatchObject({ index: 8, sheet: '/media/sheet-0.jpg', x: 480, y: 90, w: 160, h: 90 });
  });
});

describe('glossary wording', () => {
  it('says where a name is spoken, with plurals', () => {
    expect(spokenSummary({ tours: 0, cues: 0, first: null })).toBe('Not said in a published tour yet.');
    expect(spokenSummary({ tours: 1, cues: 1, first: null })).toBe('Said in 1 tour (1 caption).');
    expect(spokenSummary({ tours: 2, cues: 3, first: null })).toBe('Said in 2 tours (3 captions).');
  });

  it('lists variants as a sentence (fictional demo variants)', () => {
    expect(variantsText([])).toBeNull();
    expect(variantsText(['Sora no hane'])).toBe('Also written or heard as “Sora no hane”.');
    expect(variantsText(['Yuki hotaru', 'Yukihotaru', 'Yuki-hataru'])).toBe('Also written or heard as “Yuki hotaru”, “Yukihotaru” and “Yuki-hataru”.');
    expect(matchNote({ kind: 'phonetic', score: 0.8 })).toBe('Sounds alike');
    expect(matchNote({ kind: 'exact', score: 1 })).toBeNull();
  });

  it('builds the A–Z bar with empty letters kept (to be shown disabled) and "#" only when used', () => {
    const bar = letterBar([{ letter: 'S', count: 2 }, { letter: 'a', count: 1 }]);
    expect(bar).toHaveLength(26);
    expect(bar.find((l) => l.letter === 'A')?.count).toBe(1);
    expect(bar.find((l) => l.letter === 'B')?.count).toBe(0);
    expect(letterBar([{ letter: '#', count: 1 }]).at(-1)).toEqual({ letter: '#', count: 1 });
    expect(letterParam('s')).toBe('S');
    expect(letterParam('ab')).toBe('');
  });
});
