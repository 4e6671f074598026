import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { TreeCard, WatchStop } from '@shared/schemas/watch';
import { Trail } from '@/features/tours/components/trail';
import { TreeCardPanel } from '@/features/tours/components/tree-card';
import { READER_PREFS_STORAGE_KEY } from '@/features/preferences/lib/reader-prefs';
import { forgetCsrfToken } from '@/lib/api';

// Contract: GET /api/tours/:id/watch (shared/schemas/watch.ts). Accessible names and states follow
// WAI-ARIA 1.2 (aria-current "step" for the trail's lit stone); WCAG 2.2 SC 1.4.1 (Use of Colour)
// asks that colour swatches carry their names. Unit: NIST SP 811 (1 ft = 0.3048 m; 2.5 m ≈ 8.2 ft);
// zone band: USDA map (6a from −10 °F, −23.3 °C). All records are invented demo data (fictional).

const sora: TreeCard = {
  id: 1,
  slug: 'acer-palmatum-dissectum-group-sora-no-hane',
  acceptedName: "Acer palmatum (Dissectum Group) 'Sora-no-hane'",
  nameSegments: [
    { text: 'Acer palmatum', italic: true },
    { text: " (Dissectum Group) 'Sora-no-hane'", italic: false },
  ],
  genus: 'Acer',
  species: 'palmatum',
  groupName: 'Dissectum Group',
  epithet: 'Sora-no-hane',
  status: 'approved',
  fictional: true,
  pronunciation: { text: 'SOH-rah noh HAH-neh', source: 'hepburn' },
  meaning: 'Invented name (fictional demo record).',
  keyTraits: [{ trait: 'habit', label: 'Habit', values: [{ id: 'weeping', label: 'Weeping' }] }],
  colours: [{ season: 'autumn', swatches: [{ id: 'scarlet', label: 'Scarlet', hex: '#cf2f26', accentHex: null }] }],
  size: { heightM: { min: 1.5, max: 2.5 }, spreadM: null, heightClass: 'small' },
  hardiness: { min: '6a', max: '8b', coldestF: -10, coldestC: -23.3, warmestF: 25, warmestC: -3.9 },
  container: { suitability: 'good', label: 'Suits a container', caution: 'Large containers are heavy: lift with help.' },
  link: '/cultivars/acer-palmatum-dissectum-group-sora-no-hane',
};

const stops: WatchStop[] = [
  { id: 21, startMs: 2_000, endMs: 10_000, title: 'Sora-no-hane', chapterTitle: 'Sora-no-hane', thumbnail: null, cultivar: sora },
  { id: 22, startMs: 10_000, endMs: 16_000, title: 'Unlabelled tree 2', chapterTitle: 'Unlabelled tree 2', thumbnail: null, cultivar: null },
];

const fetchMock = vi.fn<typeof fetch>();

function wrap(node: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>{node}</MemoryRouter>
    </QueryClientProvider>,
  );
}

beforeEach(() => {
  forgetCsrfToken();
  fetchMock.mockReset();
  fetchMock.mockImplementation(async (input) => (String(input) === '/api/auth/me' ? Response.json({ user: null }) : Response.json({}, { status: 404 })));
  vi.stubGlobal('fetch', fetchMock);
  window.localStorage.clear();
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('Trail', () => {
  it('has one button per stop, the playing one lit, each going to its stop', () => {
    const onGo = vi.fn();
    wrap(<Trail stops={stops} durationMs={16_000} currentIndex={1} onGo={onGo} />);
    const stones = screen.getAllByRole('button');
    expect(stones).toHaveLength(2);
    expect(stones[0]!.getAttribute('aria-label')).toBe("Stop 1: Acer palmatum (Dissectum Group) 'Sora-no-hane', at 2 seconds");
    expect(stones[1]!.getAttribute('aria-label')).toBe('Stop 2: Unlabelled tree 2 (unidentified tree), at 10 seconds');
    expect(stones.map((b) => b.getAttribute('aria-current'))).toEqual([null, 'step']);
    fireEvent.click(stones[0]!);
    expect(onGo).toHaveBeenCalledWith(0);
  });
});

describe('TreeCardPanel', () => {
  it('shows the record: name, how to say it, named colour swatches, size in the reader’s unit and hardiness', async () => {
    window.localStorage.setItem(READER_PREFS_STORAGE_KEY, JSON.stringify({ unitSystem: 'imperial', zone: '5a', container: false }));
    const { container } = wrap(<TreeCardPanel stops={stops} currentIndex={0} nextIndex={null} onGo={() => {}} />);
    expect(container.querySelector('h3 i')?.textContent).toBe('Acer palmatum');
    expect(screen.getByText('SOH-rah noh HAH-neh')).toBeTruthy();
    const autumn = screen.getByRole('list', { name: 'Autumn colours' });
    expect(within(autumn).getByText('Scarlet')).toBeTruthy();
    // 1.5–2.5 m is 4.9–8.2 ft; the range shares the precision of its larger end.
    expect(screen.getByText('4.9–8.2 ft')).toBeTruthy();
    expect(screen.getByText('Zones 6a to 8b: winters down to −10 °F (−23.3 °C)')).toBeTruthy();
    // The reader's zone 5a is colder than 6a, so the badge says so in words.
    expect(await screen.findByText('Not for zone 5a')).toBeTruthy();
    expect(screen.getByText(/Large containers are heavy/)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'The full record of ‘Sora-no-hane’' }).getAttribute('href')).toBe(sora.link);
  });

  it('switches the size between metres and feet for a visitor, remembered in this browser', async () => {
    wrap(<TreeCardPanel stops={stops} currentIndex={0} nextIndex={null} onGo={() => {}} />);
    expect(screen.getByText('1.5–2.5 m')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Show in feet' }));
    // NIST SP 811: 2.5 m / 0.3048 = 8.2 ft.
    expect(await screen.findByText('4.9–8.2 ft')).toBeTruthy();
    expect(JSON.parse(window.localStorage.getItem(READER_PREFS_STORAGE_KEY) ?? '{}').unitSystem).toBe('imperial');
  });

  it('shows an unidentified tree, and the way on between stops', () => {
    wrap(<TreeCardPanel stops={stops} currentIndex={1} nextIndex={null} onGo={() => {}} />);
    expect(screen.getByRole('heading', { name: 'Unidentified tree' })).toBeTruthy();
    cleanup();
    const onGo = vi.fn();
    wrap(<TreeCardPanel stops={stops} currentIndex={-1} nextIndex={0} onGo={onGo} />);
    expect(screen.getByRole('heading', { name: 'Between stops' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Go to stop 1' }));
    expect(onGo).toHaveBeenCalledWith(0);
  });
});
