import { describe, expect, it } from 'vitest';
import { updateTourInput } from '@shared/schemas/tours';
import { changedDetails, detailsInputFrom } from '@/features/tours/lib/details';
import { linkTarget } from '@/lib/link-target';
import { pageFromParams } from '@/lib/route-params';
import { pickRendition } from '@/features/tours/lib/renditions';

// Invented data for the fictional Fernhollow Maple Circle.
const saved = { title: 'Spring walk by the pond', garden: 'Pellworth Sunken Garden (fictional)', filmedOn: '2026-04-18', descriptionHtml: '<p>Maples in leaf.</p>' };

describe('details form → shared schema (updateTourInput, the server’s own contract)', () => {
  it('turns an empty date into null and an empty editor document into no description', () => {
    const input = detailsInputFrom({ title: 'A', garden: '', filmedOn: '  ', descriptionHtml: '<p></p>' });
    expect(input).toMatchObject({ filmedOn: null, descriptionHtml: '' });
  });

  it('passes valid values through the schema and fails a short title with the schema’s message', () => {
    const ok = updateTourInput.safeParse(detailsInputFrom({ ...saved, title: '  Autumn walk  ' }));
    expect(ok.success && ok.data.title).toBe('Autumn walk');
    const bad = updateTourInput.safeParse(detailsInputFrom({ ...saved, title: 'ab' }));
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.message).toBe('Use at least 3 characters.');
  });

  it('leaves out what a PATCH does not name, so saving one field never clears another (RFC 7396 JSON Merge Patch: absent members are left unchanged)', () => {
    expect(updateTourInput.parse({ descriptionHtml: '<p>Maples in leaf.</p>' })).toEqual({ descriptionHtml: '<p>Maples in leaf.</p>' });
    expect(updateTourInput.parse({ filmedOn: null })).toEqual({ filmedOn: null });
  });

  it('sends only what changed', () => {
    expect(changedDetails(saved, { ...saved })).toEqual({});
    expect(changedDetails(saved, { ...saved, garden: 'Oduya Courtyard (fictional)', filmedOn: null })).toEqual({
      garden: 'Oduya Courtyard (fictional)',
      filmedOn: null,
    });
  });
});

describe('linkTarget (schemes the server keeps: http, https, mailto — WHATWG URL parsing)', () => {
  it.each([
    ['https://fernhollow.example/maples', 'https://fernhollow.example/maples'],
    ['fernhollow.example', 'https://fernhollow.example/'],
    ['fernhollow.example:8080/a', 'https://fernhollow.example:8080/a'],
    ['mailto:club@fernhollow.example', 'mailto:club@fernhollow.example'],
  ])('%s → %s', (raw, href) => {
    expect(linkTarget(raw)).toBe(href);
  });

  it.each([['javascript:alert(1)'], ['data:text/html,hi'], ['file:///etc/passwd'], ['maples'], [''], ['http://']])('refuses %j', (raw) => {
    expect(linkTarget(raw)).toBeNull();
  });
});

describe('pageFromParams', () => {
  it('reads whole positive numbers and falls back to 1 otherwise', () => {
    expect(pageFromParams(new URLSearchParams('page=3'))).toBe(3);
    for (const bad of ['page=0', 'page=-2', 'page=2.5', 'page=abc', 'page=', '']) expect(pageFromParams(new URLSearchParams(bad))).toBe(1);
    // The server's own limit (pageQuerySchema): page 100,000 is the last it answers.
    expect(pageFromParams(new URLSearchParams('page=100000'))).toBe(100_000);
    expect(pageFromParams(new URLSearchParams('page=100001'))).toBe(1);
  });
});

describe('pickRendition (smallest version at least as wide as the player in device pixels)', () => {
  const r = (height: number, width: number) => ({ height, width, url: `/m/${height}.mp4`, bytes: 1, label: `${height}p` });
  const ladder = [r(1080, 1920), r(720, 1280), r(480, 854), r(360, 640)];

  it('chooses by device pixels', () => {
    // 800 CSS px at 1× need 800 device px: 854-wide 480p is the smallest that covers it.
    expect(pickRendition(ladder, 800, 1)?.label).toBe('480p');
    expect(pickRendition(ladder, 900, 1)?.label).toBe('720p');
    expect(pickRendition(ladder, 800, 2)?.label).toBe('1080p');
    expect(pickRendition(ladder, 360, 1)?.label).toBe('360p');
    expect(pickRendition(ladder, 600, 1.5)?.label).toBe('720p');
  });

  it('falls back to the largest when the screen is larger than every version, and to nothing without versions', () => {
    expect(pickRendition([r(360, 640), r(480, 854)], 2000, 1)?.label).toBe('480p');
    expect(pickRendition([], 800)).toBeNull();
  });
});
