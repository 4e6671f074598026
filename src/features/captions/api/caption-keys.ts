/**
 * Cache keys for captions: a tour's track list, one track with its cues, and a tour's transcript
 * per language, so an import or a save refreshes exactly what it touched.
 */
export const captionKeys = {
  all: ['captions'] as const,
  tracks: (tourId: number) => [...captionKeys.all, 'tracks', tourId] as const,
  track: (trackId: number) => [...captionKeys.all, 'track', trackId] as const,
  transcripts: (tourId: number) => [...captionKeys.all, 'transcript', tourId] as const,
  transcript: (tourId: number, lang: string | null) => [...captionKeys.transcripts(tourId), lang ?? 'first'] as const,
};
