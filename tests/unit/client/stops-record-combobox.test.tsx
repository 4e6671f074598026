import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { RecordCombobox, type StopRecord } from '@/features/stops/components/record-combobox';

// Checked against the W3C WAI-ARIA Authoring Practices "Combobox Pattern" (list autocomplete):
// the input has role combobox with aria-expanded and aria-controls; Down/Up move the active
// option, announced through aria-activedescendant and aria-selected; Enter accepts; Escape closes.
// The records are invented demo records ('Sora-no-hane', 'Mizu-kagari' are fictional epithets).

const records = [
  {
    id: 11,
    slug: 'acer-palmatum-sora-no-hane',
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
  },
  {
    id: 12,
    slug: 'acer-palmatum-mizu-kagari',
    acceptedName: "Acer palmatum (Dissectum Group) 'Mizu-kagari'",
    nameSegments: [
      { text: 'Acer palmatum', italic: true },
      { text: " (Dissectum Group) 'Mizu-kagari'", italic: false },
    ],
    genus: 'Acer',
    species: 'palmatum',
    groupName: 'Dissectum Group',
    epithet: 'Mizu-kagari',
    status: 'approved',
    fictional: true,
  },
];

beforeEach(() => {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL) => {
      const url = new URL(String(input), 'http://localhost');
      if (url.pathname === '/api/cultivars') {
        return new Response(JSON.stringify({ items: records, total: records.length, page: 1, pageSize: 8 }), { status: 200, headers: { 'content-type': 'application/json' } });
      }
      return new Response('{}', { status: 404 });
    }),
  );
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderBox(value: StopRecord | null = null) {
  const onChange = vi.fn();
  const onPropose = vi.fn();
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <RecordCombobox label="Cultivar record" value={value} onChange={onChange} onPropose={onPropose} />
    </QueryClientProvider>,
  );
  return { onChange, onPropose, input: screen.getByRole('combobox', { name: 'Cultivar record' }) };
}

describe('the record picker combobox', () => {
  it('opens on focus with "Unidentified tree" first, the matching records in italics with the demo mark, and "Propose a new cultivar record" last', async () => {
    const { input } = renderBox();
    expect(input.getAttribute('aria-expanded')).toBe('false');
    fireEvent.focus(input);
    expect(input.getAttribute('aria-expanded')).toBe('true');
    const list = screen.getByRole('listbox');
    expect(input.getAttribute('aria-controls')).toBe(list.id);
    await screen.findByText('Sora-no-hane', { exact: false });
    const options = within(list).getAllByRole('option');
    expect(options.map((o) => o.textContent)).toEqual([
      expect.stringMatching(/^Unidentified tree/),
      expect.stringContaining("'Sora-no-hane'"),
      expect.stringContaining("'Mizu-kagari'"),
      expect.stringMatching(/^Propose a new cultivar record/),
    ]);
    expect(options[1]!.querySelector('i')?.textContent).toBe('Acer palmatum');
    expect(within(options[1]!).getByText('Invented for the demo')).toBeTruthy();
  });

  it('moves the active option with the arrow keys through aria-activedescendant and picks it with Enter', async () => {
    const { input, onChange } = renderBox();
    fireEvent.focus(input);
    await screen.findByText('Mizu-kagari', { exact: false });
    const options = screen.getAllByRole('option');
    expect(input.getAttribute('aria-activedescendant')).toBe(options[0]!.id);
    fireEvent.keyDown(input, { key: 'ArrowDown' });
    fireEvent.keyDown(input, { key: 'ArrowDown' });
    expect(input.getAttribute('aria-activedescendant')).toBe(options[2]!.id);
    expect(options[2]!.getAttribute('aria-selected')).toBe('true');
    expect(options[0]!.getAttribute('aria-selected')).toBe('false');
    fireEvent.keyDown(input, { key: 'ArrowUp' });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(onChange).toHaveBeenCalledWith(expect.objectContaining({ id: 11, epithet: 'Sora-no-hane' }));
    expect(input.getAttribute('aria-expanded')).toBe('false');
  });

  it('wraps from the top to "Propose a new cultivar record", which opens the proposal with the typed text; Escape closes', async () => {
    const { input, onPropose, onChange } = renderBox({ id: 11, acceptedName: records[0]!.acceptedName, fictional: true });
    expect(screen.getByText(records[0]!.acceptedName, { exact: false })).toBeTruthy();
    fireEvent.change(input, { target: { value: 'Tsuki-akari' } });
    await act(async () => {
      await new Promise((r) => setTimeout(r, 250));
    });
    fireEvent.keyDown(input, { key: 'ArrowUp' });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(onPropose).toHaveBeenCalledWith('Tsuki-akari');
    fireEvent.focus(input);
    fireEvent.keyDown(input, { key: 'Escape' });
    expect(input.getAttribute('aria-expanded')).toBe('false');
    fireEvent.focus(input);
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(onChange).toHaveBeenCalledWith(null);
  });
});
