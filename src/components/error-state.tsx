import { errorMessage } from '@/lib/api';
import { Button } from './button';

/** Shown in place of data that could not be loaded, with a way to try again when that can help. */
export function ErrorState({ title = 'This could not be loaded', error, onRetry }: { title?: string; error: unknown; onRetry?: () => void }) {
  return (
    <div role="alert" className="my-6 rounded-lg border border-rule bg-card p-5 shadow-leaf">
      <h2 className="text-lg text-maple">{title}</h2>
      <p className="mt-1">{errorMessage(error)}</p>
      {onRetry && (
        <Button variant="secondary" className="mt-4" onClick={onRetry}>
          Try again
        </Button>
      )}
    </div>
  );
}
