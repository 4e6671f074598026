import { useEffect } from 'react';

/** The page description and its Open Graph preview fields. */
export interface HeadMeta {
  description: string;
  /** og:title; the page's own title by default. */
  title: string;
  /** og:type, "website" unless the page says otherwise (a tour is "video.other"). */
  type?: string;
  /** og:image, an address relative to the site or absolute. */
  image?: string | null;
}

function upsert(selector: string, create: () => HTMLMetaElement): { el: HTMLMetaElement; before: string | null; created: boolean } {
  let el = document.head.querySelector<HTMLMetaElement>(selector);
  const created = !el;
  if (!el) {
    el = create();
    document.head.appendChild(el);
  }
  return { el, before: created ? null : el.getAttribute('content'), created };
}

function named(name: string) {
  return upsert(`meta[name="${name}"]`, () => {
    const m = document.createElement('meta');
    m.setAttribute('name', name);
    return m;
  });
}

function property(prop: string) {
  return upsert(`meta[property="${prop}"]`, () => {
    const m = document.createElement('meta');
    m.setAttribute('property', prop);
    return m;
  });
}

/**
 * Sets <meta name="description"> and the Open Graph title, description, type, URL and picture for
 * the page while it is shown, and puts back what was there before when it goes. Set in the
 * browser, so it serves bookmarks, the browser's own share sheet and readers; crawlers that do not
 * run scripts see the site's defaults.
 */
export function useHeadMeta(meta: HeadMeta | null): void {
  const description = meta?.description ?? null;
  const title = meta?.title ?? null;
  const type = meta?.type ?? 'website';
  const image = meta?.image ?? null;
  useEffect(() => {
    if (description == null || title == null) return;
    const entries = [
      [named('description'), description],
      [property('og:title'), title],
      [property('og:description'), description],
      [property('og:type'), type],
      [property('og:url'), window.location.href],
      ...(image ? ([[property('og:image'), new URL(image, window.location.origin).toString()]] as const) : []),
    ] as const;
    for (const [slot, value] of entries) slot.el.setAttribute('content', value);
    return () => {
      for (const [slot] of entries) {
        if (slot.created) slot.el.remove();
        else if (slot.before != null) slot.el.setAttribute('content', slot.before);
      }
    };
  }, [description, title, type, image]);
}
