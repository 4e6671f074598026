/**
 * Cache keys for stops: a tour's list and its suggestions per caption language, so a stop change
 * refreshes the list and the suggestions together.
 */
export const stopKeys = {
  all: ['stops'] as const,
  list: (tourId: number) => [...stopKeys.all, 'list', tourId] as const,
  allSuggestions: (tourId: number) => [...stopKeys.all, 'suggestions', tourId] as const,
  suggestions: (tourId: number, lang: string | null) => [...stopKeys.allSuggestions(tourId), lang ?? 'first'] as const,
};
