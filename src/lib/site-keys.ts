/** The parts of a key press the site-wide shortcuts look at (a plain object in tests). */
export interface SiteKeyPress {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  /** The focused element's tag, and whether it is editable text. */
  targetTag?: string;
  editable?: boolean;
}

const FIELDS = new Set(['INPUT', 'TEXTAREA', 'SELECT']);

/**
 * "/" moves to the search box from anywhere on the site, except while typing (a "/" in a caption
 * or a date stays a "/") and with Ctrl, Cmd or Alt (browser and screen-reader commands).
 */
export function isSearchShortcut(press: SiteKeyPress): boolean {
  if (press.key !== '/' || press.ctrlKey || press.metaKey || press.altKey) return false;
  return !press.editable && !FIELDS.has((press.targetTag ?? '').toUpperCase());
}

/** localStorage key of the "/" shortcut choice (WCAG 2.1.4: a single-key shortcut can be turned off). */
export const SLASH_SEARCH_KEY = 'grovewalk.slash-search';

/** The part of Storage the choice uses. */
export interface KeyPrefStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

/** Whether "/" jumps to the search box: yes until the reader turns it off. */
export function readSlashSearchOn(storage: KeyPrefStorage | null | undefined): boolean {
  try {
    return storage?.getItem(SLASH_SEARCH_KEY) !== 'off';
  } catch {
    return true;
  }
}

/** Remembers the reader's choice for the "/" shortcut in this browser. */
export function writeSlashSearchOn(storage: KeyPrefStorage | null | undefined, on: boolean): void {
  try {
    storage?.setItem(SLASH_SEARCH_KEY, on ? 'on' : 'off');
  } catch {
    /* not remembered */
  }
}
