import { forwardRef } from 'react';
import { EDITOR_SHORTCUTS } from '../lib/editor-keys';

/**
 * The editor's keyboard shortcuts, read from the same table the key handler uses. A disclosure, so
 * it stays out of the way until wanted; "?" opens and closes it.
 */
export const ShortcutHelp = forwardRef<HTMLDetailsElement>(function ShortcutHelp(_props, ref) {
  return (
    <details ref={ref} className="rounded-md border border-rule bg-card px-3 py-2 text-sm">
      <summary className="cursor-pointer font-ui font-bold text-moss">Keyboard shortcuts</summary>
      <table className="mt-2 w-full border-collapse">
        <caption className="sr-only">Keyboard shortcuts of the caption editor</caption>
        <thead>
          <tr className="text-left font-ui text-xs text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-semibold">
              Keys
            </th>
            <th scope="col" className="py-1 font-semibold">
              What they do
            </th>
          </tr>
        </thead>
        <tbody>
          {EDITOR_SHORTCUTS.map((line) => (
            <tr key={line.aria} className="border-t border-rule align-top">
              <td className="py-1 pr-3 whitespace-nowrap">
                {line.keys.map((k, i) => (
                  <span key={i}>
                    {i > 0 && <span aria-hidden="true"> + </span>}
                    <kbd className="rounded border border-edge bg-paper px-1.5 py-0.5 font-mono text-xs">{k}</kbd>
                  </span>
                ))}
              </td>
              <td className="py-1">{line.does}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-ink-soft">On a Mac, use Option for Alt and Cmd for Ctrl. Alt shortcuts also work while typing in a cue.</p>
    </details>
  );
});
