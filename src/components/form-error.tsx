import type { ReactNode } from 'react';

/**
 * The message for a whole form (usually the server's answer). role="alert" makes screen readers
 * announce it the moment it appears; `children` hold a follow-up action such as "send a new link".
 */
export function FormError({ message, children }: { message?: string | null; children?: ReactNode }) {
  if (!message) return null;
  return (
    <div role="alert" className="rounded-md border-l-4 border-maple bg-maple-wash px-4 py-3 text-ink">
      <p className="font-bold">{message}</p>
      {children && <div className="mt-2">{children}</div>}
    </div>
  );
}

/** A confirmation that something worked; polite, so it does not interrupt the reader. */
export function FormSuccess({ children }: { children: ReactNode }) {
  return (
    <div role="status" className="rounded-md border-l-4 border-moss bg-moss-wash px-4 py-3 text-ink">
      {children}
    </div>
  );
}
