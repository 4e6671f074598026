import type { ReactNode } from 'react';

/** A raised paper panel that groups one form or one block of facts. */
export function Card({ children, className = '' }: { children: ReactNode; className?: string }) {
  return <div className={`rounded-lg border border-rule bg-card p-5 shadow-leaf sm:p-6 ${className}`}>{children}</div>;
}
