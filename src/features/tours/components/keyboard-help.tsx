import { useEffect, useId, useRef } from 'react';
import { Button } from '@/components/button';
import { SlashShortcutToggle } from '@/components/site-search';
import { SHORTCUT_HELP } from '../lib/player-keys';

/** Keys that work on every page, listed after the tour page's own. */
const SITE_KEYS: { keys: string[]; does: string }[] = [{ keys: ['/'], does: 'Go to the search box' }];

/**
 * The list of keyboard keys of the tour page, in a modal dialog (the native <dialog>: focus moves
 * in, Escape closes it and focus goes back to what opened it).
 */
export function KeyboardHelp({ open, onClose }: { open: boolean; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  const rows = [...SHORTCUT_HELP, ...SITE_KEYS];
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto w-[min(34rem,calc(100vw-2rem))] rounded-lg border border-rule bg-card p-0 text-ink shadow-leaf"
    >
      <div className="p-6">
        <h2 id={titleId} className="text-xl text-moss-deep">
          Keyboard shortcuts
        </h2>
        <p className="mt-2 text-sm text-ink-soft">
          The tour’s keys work while the video, the trail, the tree card or the transcript has the focus, and never while you type in a box. In the transcript, ↑ and ↓ move between lines.
        </p>
        <table className="mt-3 w-full text-left text-sm">
          <caption className="sr-only">Keyboard shortcuts for the video</caption>
          <thead>
            <tr>
              <th scope="col" className="py-1 pr-4 font-ui font-bold">
                Keys
              </th>
              <th scope="col" className="py-1 font-ui font-bold">
                What they do
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.does} className="border-t border-rule">
                <td className="py-1.5 pr-4 whitespace-nowrap">
                  {row.keys.map((k, i) => (
                    <span key={k}>
                      {i > 0 && <span className="text-ink-soft"> or </span>}
                      <kbd className="rounded border border-edge bg-paper px-1.5 py-0.5 font-mono text-xs">{k}</kbd>
                    </span>
                  ))}
                </td>
                <td className="py-1.5">{row.does}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <div className="mt-4 border-t border-rule pt-3">
          <SlashShortcutToggle />
        </div>
        <div className="mt-5 flex justify-end">
          <Button variant="primary" onClick={onClose} autoFocus>
            Close
          </Button>
        </div>
      </div>
    </dialog>
  );
}
