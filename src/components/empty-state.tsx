import type { ReactNode } from 'react';

/** Says plainly that a list has nothing in it yet (or nothing matching), instead of a blank area. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="my-6 rounded-lg border border-dashed border-edge bg-card px-5 py-8 text-center">
      <p className="font-bold">{title}</p>
      {children && <div className="mt-2 text-ink-soft">{children}</div>}
    </div>
  );
}
