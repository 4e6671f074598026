import { useEffect, type ReactNode } from 'react';

/** Keeps the browser tab's title in step with the page, which is also what screen readers announce first. */
export function useDocumentTitle(title: string): void {
  useEffect(() => {
    document.title = title ? `${title} · Grovewalk` : 'Grovewalk';
  }, [title]);
}

const widths = { narrow: 'max-w-lg', medium: 'max-w-3xl', wide: 'max-w-6xl' } as const;

/** Props of Page: its one h1, an optional lead paragraph, and how wide its content may grow. */
export interface PageProps {
  title: string;
  intro?: ReactNode;
  width?: keyof typeof widths;
  children: ReactNode;
}

/** The frame of every screen: the single h1, the document title and a readable measure. */
export function Page({ title, intro, width = 'narrow', children }: PageProps) {
  useDocumentTitle(title);
  return (
    <div className={`mx-auto w-full ${widths[width]} px-4 py-8 sm:px-6 sm:py-12`}>
      <h1 className="text-3xl text-moss-deep sm:text-4xl">{title}</h1>
      {intro && <div className="mt-3 text-lg text-ink-soft">{intro}</div>}
      <div className="mt-8">{children}</div>
    </div>
  );
}
