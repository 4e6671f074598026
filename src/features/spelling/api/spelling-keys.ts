import type { SpellingFixStatusName } from '@shared/schemas/spelling-fixes';

/** Cache keys of spelling fixes and of the caption text the flagging and preview screens read. */
export const spellingKeys = {
  all: ['spelling'] as const,
  lists: () => [...spellingKeys.all, 'list'] as const,
  list: (status: SpellingFixStatusName, page: number) => [...spellingKeys.lists(), status, page] as const,
  detail: (id: number) => [...spellingKeys.all, 'detail', id] as const,
  preview: (id: number, text: string) => [...spellingKeys.all, 'preview', id, text] as const,
  captions: () => [...spellingKeys.all, 'captions'] as const,
  tour: (tourId: number) => [...spellingKeys.captions(), 'tour', tourId] as const,
  tracks: (tourId: number) => [...spellingKeys.captions(), 'tracks', tourId] as const,
  track: (trackId: number) => [...spellingKeys.captions(), 'track', trackId] as const,
};
