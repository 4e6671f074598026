import { useEffect, useId, useRef, useState } from 'react';
import { useLocation, useNavigate } from 'react-router';
import { isSearchShortcut, readSlashSearchOn, writeSlashSearchOn } from '@/lib/site-keys';

function storage(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}

/**
 * The switch for the "/" shortcut (WCAG 2.1.4, Character Key Shortcuts: a one-key shortcut can be
 * turned off). Shown wherever the site's keys are listed.
 */
export function SlashShortcutToggle() {
  const [on, setOn] = useState(() => readSlashSearchOn(storage()));
  const id = useId();
  return (
    <label htmlFor={id} className="flex items-center gap-2 font-ui text-sm">
      <input
        id={id}
        type="checkbox"
        checked={on}
        onChange={(e) => {
          setOn(e.target.checked);
          writeSlashSearchOn(storage(), e.target.checked);
        }}
        className="size-4 accent-moss"
      />
      Press <kbd className="rounded border border-edge bg-paper px-1.5 font-mono text-xs">/</kbd> to go to the search box from any page
    </label>
  );
}

function searchTextOf(pathname: string, search: string): string {
  return pathname === '/search' ? (new URLSearchParams(search).get('q') ?? '') : '';
}

/**
 * The one search box of the site, in the header of every page: names (even misspelt), traits and
 * words from tours. "/" jumps to it from anywhere except a text field (unless the reader turned
 * that off); on the results page it holds the current search so it can be changed in place.
 */
export function SiteSearch({ className = '' }: { className?: string }) {
  const navigate = useNavigate();
  const { pathname, search } = useLocation();
  const [text, setText] = useState(() => searchTextOf(pathname, search));
  const input = useRef<HTMLInputElement>(null);
  const id = useId();

  // Following a link to another search (or leaving the results) puts the box in step.
  useEffect(() => setText(searchTextOf(pathname, search)), [pathname, search]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      if (e.defaultPrevented || !readSlashSearchOn(storage()) || !isSearchShortcut({ key: e.key, ctrlKey: e.ctrlKey, metaKey: e.metaKey, altKey: e.altKey, targetTag: target?.tagName, editable: target?.isContentEditable })) return;
      e.preventDefault();
      input.current?.focus();
      input.current?.select();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, []);

  return (
    <form
      role="search"
      aria-label="Site"
      className={`flex items-stretch ${className}`}
      onSubmit={(e) => {
        e.preventDefault();
        const q = text.trim();
        if (q) navigate(`/search?q=${encodeURIComponent(q)}`);
        else input.current?.focus();
      }}
    >
      <label htmlFor={id} className="sr-only">
        Search names, traits and tours
      </label>
      <input
        ref={input}
        id={id}
        type="search"
        value={text}
        onChange={(e) => setText(e.target.value)}
        placeholder="Search names, traits, tours"
        maxLength={200}
        autoComplete="off"
        aria-keyshortcuts="/"
        className="min-h-10 w-full min-w-0 rounded-l-md border border-r-0 border-edge bg-card px-3 py-1.5 font-ui text-sm placeholder:text-ink-soft"
      />
      <button type="submit" className="flex min-h-10 shrink-0 items-center gap-1.5 rounded-r-md border border-moss bg-moss px-3 font-ui text-sm font-bold text-card hover:bg-moss-deep">
        <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
          <circle cx="8.5" cy="8.5" r="5.5" fill="none" stroke="currentColor" strokeWidth="2" />
          <path d="M13 13l4.5 4.5" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        </svg>
        <span>Search</span>
      </button>
    </form>
  );
}
