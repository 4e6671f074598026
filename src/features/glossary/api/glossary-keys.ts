/** Cache keys of the glossary: one answer per search text and letter. */
export const glossaryKeys = {
  all: ['glossary'] as const,
  list: (q: string, letter: string) => [...glossaryKeys.all, 'list', q, letter] as const,
};
