// The record form sends notes only when they were edited, so a record saved for another change keeps
// its notes exactly as stored (formatting included). A Grovewalk rule, no outside source; the record
// is invented (fictional).
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { CultivarFull, CultivarInput } from '@shared/schemas/cultivars';
import { RecordForm } from '@/features/cultivars/components/record-form';

afterEach(cleanup);

const record = {
  genus: 'Acer',
  species: 'palmatum',
  infraspecificRank: null,
  infraspecificEpithet: null,
  groupName: null,
  epithet: 'Tallowmere Gold',
  pronunciation: null,
  respelling: null,
  meaning: null,
  traits: null,
  notesHtml: '<p><strong>Bark</strong> glows in winter.</p>',
  fictional: true,
} as unknown as CultivarFull;

describe('record notes on save', () => {
  it('leaves stored notes out of a save that did not touch them', async () => {
    const onSubmit = vi.fn<(input: CultivarInput) => void>();
    render(<RecordForm initial={record} system="metric" submitLabel="Save changes" busy={false} error={null} onSubmit={onSubmit} />);
    fireEvent.change(screen.getByLabelText('Cultivar epithet'), { target: { value: 'Tallowmere Glow' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ epithet: 'Tallowmere Glow' });
    expect(onSubmit.mock.calls[0]![0]).not.toHaveProperty('notesHtml');
  });
});
