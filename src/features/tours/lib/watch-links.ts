import { clockText, startParam } from '@/lib/tour-moment';

/** The tour page opened at a stop: it starts at the stop's first second with its tree card showing. */
export function stopPath(tourId: number, stopId: number, atMs?: number | null): string {
  const base = `/tours/${tourId}/stops/${stopId}`;
  return atMs != null && atMs >= 0 ? `${base}?t=${startParam(atMs)}` : base;
}

/**
 * The tour page at a moment. Whole seconds, rounded down, so a shared link never opens after the
 * moment the viewer meant; under one second is the start of the tour and needs no ?t=.
 */
export function momentPath(tourId: number, seconds: number): string {
  const whole = Math.floor(Math.max(0, Number.isFinite(seconds) ? seconds : 0));
  return whole >= 1 ? `/tours/${tourId}?t=${whole}` : `/tours/${tourId}`;
}

/** An app path as a full address for sharing. */
export function absoluteUrl(origin: string, path: string): string {
  return new URL(path, origin).toString();
}

/** What the page title and link previews say about the stop playing now. */
export interface StopNaming {
  number: number;
  /** The record's accepted name, or null for an unidentified tree. */
  name: string | null;
  title: string;
}

/** How a stop is named in titles and lists: its record's name, else the author's title, else its number. */
export function stopName(stop: StopNaming): string {
  if (stop.name) return stop.name;
  const title = stop.title.trim();
  return title ? `${title} (unidentified tree)` : `Stop ${stop.number} (unidentified tree)`;
}

/**
 * The browser tab's title: the stop first while one is playing (the tab then says which tree is on
 * screen), then the tour. The site name is added by the page frame.
 */
export function watchTitle(tourTitle: string, stop: StopNaming | null): string {
  return stop ? `Stop ${stop.number}: ${stopName(stop)} – ${tourTitle}` : tourTitle;
}

/** The text of the page's description and link previews, at most `max` characters, cut at a word. */
export function watchDescription(input: { tourTitle: string; garden: string; author: string; stop: (StopNaming & { startMs: number }) | null; stopCount: number }, max = 200): string {
  const where = input.garden ? ` in ${input.garden}` : '';
  const lead = input.stop
    ? `Stop ${input.stop.number} at ${clockText(input.stop.startMs)}: ${stopName(input.stop)}. `
    : '';
  const text = `${lead}A filmed garden tour by ${input.author}${where}, with ${input.stopCount} tree${input.stopCount === 1 ? '' : 's'} named on the trail: "${input.tourTitle}".`;
  if (text.length <= max) return text;
  const cut = text.slice(0, max - 1);
  const space = cut.lastIndexOf(' ');
  return `${(space > max / 2 ? cut.slice(0, space) : cut).replace(/[\s,.:;–-]+$/, '')}…`;
}

/** localStorage key of the viewer's captions choice. */
export const CAPTIONS_PREF_KEY = 'grovewalk.captions';

/** The small part of the Storage interface the captions choice uses (a Map-backed fake in tests). */
export interface PrefStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

/** Whether captions start on: yes unless the viewer turned them off before (captions are on by default). */
export function readCaptionsOn(storage: PrefStorage | null | undefined): boolean {
  try {
    return storage?.getItem(CAPTIONS_PREF_KEY) !== 'off';
  } catch {
    // Storage switched off (private windows, strict settings): the default applies.
    return true;
  }
}

/** Remembers the viewer's captions choice for the next tour. */
export function writeCaptionsOn(storage: PrefStorage | null | undefined, on: boolean): void {
  try {
    storage?.setItem(CAPTIONS_PREF_KEY, on ? 'on' : 'off');
  } catch {
    /* not remembered; captions start on next time */
  }
}
