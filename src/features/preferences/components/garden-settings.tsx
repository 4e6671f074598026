import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { CONTAINER_CAUTION, USDA_ZONES, isUsdaZone, type TemperatureScale } from '@shared/hardiness';
import type { UnitSystem } from '@shared/units';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { errorMessage } from '@/lib/api';
import { useReaderPrefs } from '../hooks/use-reader-prefs';
import { UNIT_SYSTEM_LABELS, zoneBandText, zoneFromTypedTemperature } from '../lib/reader-prefs';

/** Props of GardenSettings: which parts to show where. */
export interface GardenSettingsProps {
  /** The account page already has units under Profile, so it leaves them out here. */
  showUnits?: boolean;
  /** Tighter spacing and a smaller heading, for the panel on the finder. */
  compact?: boolean;
  /** Heading level of "My garden" (2 on the account page, 3 inside another section). */
  headingLevel?: 2 | 3;
}

const unitChoices: { value: UnitSystem; label: string }[] = [
  { value: 'metric', label: UNIT_SYSTEM_LABELS.metric },
  { value: 'imperial', label: UNIT_SYSTEM_LABELS.imperial },
];

/** The temperature box that works a zone out for readers who do not know theirs. */
function ZoneFromTemperature({ onZone }: { onZone: (zone: (typeof USDA_ZONES)[number]) => void }) {
  const id = useId();
  const [text, setText] = useState('');
  const [scale, setScale] = useState<TemperatureScale>('C');
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const result = zoneFromTypedTemperature(text, scale);
    if (result.ok) {
      onZone(result.zone);
      setMessage({ ok: true, text: `That is zone ${result.zone}: ${zoneBandText(result.zone)}. Your zone is now set to ${result.zone}.` });
    } else {
      setMessage({ ok: false, text: result.message });
    }
  };

  return (
    <form onSubmit={submit} noValidate className="mt-3 space-y-3" aria-label="Work out my zone">
      <div>
        <label htmlFor={`${id}-t`} className="block font-bold">
          Average coldest winter night
        </label>
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          The lowest temperature of a typical winter where the tree grows, averaged over several years. Your national weather service often
          publishes it.
        </p>
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <input
            id={`${id}-t`}
            inputMode="decimal"
            value={text}
            onChange={(e) => setText(e.target.value)}
            aria-describedby={`${id}-hint${message ? ` ${id}-msg` : ''}`}
            aria-invalid={message && !message.ok ? true : undefined}
            className="w-28 rounded-md border border-edge bg-card px-3 py-2 text-base"
            placeholder="e.g. −15"
          />
          <fieldset className="flex gap-2">
            <legend className="sr-only">Temperature scale</legend>
            {(['C', 'F'] as const).map((s) => (
              <label key={s} className="flex min-h-11 cursor-pointer items-center gap-1.5 rounded-md border border-rule bg-paper px-3">
                <input type="radio" name={`${id}-scale`} value={s} checked={scale === s} onChange={() => setScale(s)} className="size-4 accent-moss" />
                <span>°{s}</span>
              </label>
            ))}
          </fieldset>
          <Button type="submit" variant="secondary">
            Work out my zone
          </Button>
        </div>
      </div>
      {message && (
        <p id={`${id}-msg`} role={message.ok ? 'status' : 'alert'} className={message.ok ? 'font-bold text-moss-deep' : 'font-bold text-maple'}>
          {!message.ok && <span className="sr-only">Error: </span>}
          {message.text}
        </p>
      )}
    </form>
  );
}

/**
 * "My garden": hardiness zone (picked, or worked out from a temperature), units and whether the
 * tree would be in a container above ground, with what a zone means and the container caution.
 */
export function GardenSettings({ showUnits = true, compact = false, headingLevel = 2 }: GardenSettingsProps) {
  const { prefs, storedIn, setZone, setUnitSystem, setContainer, saving, saveError } = useReaderPrefs();
  const id = useId();
  const Heading = headingLevel === 2 ? 'h2' : 'h3';

  return (
    <section aria-labelledby={`${id}-h`} className={compact ? 'space-y-4' : 'space-y-5'}>
      <div>
        {/* In the panel the button above already says "My garden"; the heading stays for screen readers. */}
        <Heading id={`${id}-h`} className={compact ? 'sr-only' : 'text-xl'}>
          My garden
        </Heading>
        <p className={`text-sm text-ink-soft ${compact ? '' : 'mt-1'}`}>
          A hardiness zone sums up how cold your winters get. On the USDA map each zone is a 10 °F band of the average coldest winter
          night, split into a colder half “a” and a warmer half “b”. Grovewalk compares your zone with each cultivar’s range.
        </p>
      </div>

      <div>
        <label htmlFor={`${id}-zone`} className="block font-bold">
          Hardiness zone
        </label>
        <select
          id={`${id}-zone`}
          value={prefs.zone ?? ''}
          onChange={(e) => setZone(isUsdaZone(e.target.value) ? e.target.value : null)}
          aria-describedby={`${id}-band`}
          className="mt-1 block w-full max-w-xs rounded-md border border-edge bg-card px-3 py-2 text-base"
        >
          <option value="">Not set</option>
          {USDA_ZONES.map((z) => (
            <option key={z} value={z}>
              Zone {z}
            </option>
          ))}
        </select>
        <p id={`${id}-band`} className="mt-1 text-sm text-ink-soft">
          {prefs.zone
            ? `Zone ${prefs.zone}: average coldest winter night ${zoneBandText(prefs.zone)}.`
            : 'No zone set: tree cards cannot say yet whether a cultivar suits your garden.'}
        </p>
        <details className="mt-3 rounded-md border border-rule bg-paper px-3 py-2">
          <summary className="cursor-pointer font-bold text-moss">Not sure? Work it out from your coldest winter temperature</summary>
          <ZoneFromTemperature onZone={setZone} />
        </details>
      </div>

      {showUnits && (
        <fieldset>
          <legend className="font-bold">Sizes in</legend>
          <div className="mt-1 flex flex-wrap gap-2">
            {unitChoices.map((c) => (
              <label key={c.value} className="flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-rule bg-paper px-3">
                <input
                  type="radio"
                  name={`${id}-units`}
                  value={c.value}
                  checked={prefs.unitSystem === c.value}
                  onChange={() => setUnitSystem(c.value)}
                  className="size-4 accent-moss"
                />
                <span>{c.label}</span>
              </label>
            ))}
          </div>
        </fieldset>
      )}

      <div>
        <label className="flex cursor-pointer items-start gap-3">
          <input
            type="checkbox"
            checked={prefs.container}
            onChange={(e) => setContainer(e.target.checked)}
            aria-describedby={`${id}-pot`}
            className="mt-1.5 size-4 accent-moss"
          />
          <span className="font-bold">The tree would grow in a container above ground</span>
        </label>
        <p id={`${id}-pot`} className="mt-1 text-sm text-ink-soft">
          Roots in a pot above ground get colder than roots in the ground, so Grovewalk checks them as about one zone colder. That is common
          practice among growers, not a published rule. A container sunk into the ground counts as in the ground. This choice stays in this
          browser.
        </p>
        <p className="mt-2 rounded-md border-l-4 border-ochre bg-ochre-wash px-3 py-2 text-sm text-ink">
          <strong>Take care: </strong>
          {CONTAINER_CAUTION}
        </p>
      </div>

      <p role="status" className="text-sm text-ink-soft">
        {saving ? 'Saving…' : storedIn === 'account' ? 'Zone and units are saved in your account.' : null}
        {storedIn === 'browser' && (
          <>
            Kept in this browser only. <Link to="/sign-in">Sign in</Link> to keep your zone and units with your account.
          </>
        )}
      </p>
      <FormError message={saveError ? `Your choice could not be saved: ${errorMessage(saveError)}` : null} />
    </section>
  );
}

/**
 * A compact "My garden" button that opens the settings in a panel under it, so finder users can
 * set their zone without leaving the page. Escape or the close button folds it away again.
 */
export function GardenSettingsPanel() {
  const { prefs } = useReaderPrefs();
  const [open, setOpen] = useState(false);
  const id = useId();
  const button = useRef<HTMLButtonElement>(null);
  const panel = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (open) panel.current?.focus();
  }, [open]);

  const summary = `${prefs.zone ? `Zone ${prefs.zone}` : 'No zone set'} · ${prefs.unitSystem === 'metric' ? 'metres' : 'feet'}${prefs.container ? ' · container' : ''}`;
  const close = () => {
    setOpen(false);
    button.current?.focus();
  };

  return (
    <div
      onKeyDown={(e) => {
        if (e.key === 'Escape' && open) close();
      }}
    >
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={`${id}-panel`}
        onClick={() => setOpen(!open)}
        className="flex min-h-11 w-full items-center justify-between gap-3 rounded-md border border-edge bg-card px-3 py-2 text-left hover:bg-bark-wash"
      >
        <span>
          <span className="block font-bold">My garden</span>
          <span className="block text-sm text-ink-soft">{summary}</span>
        </span>
        <svg viewBox="0 0 20 20" className={`size-4 shrink-0 transition-transform ${open ? 'rotate-180' : ''}`} aria-hidden="true">
          <path d="M5 8l5 5 5-5" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        </svg>
      </button>
      {open && (
        <div ref={panel} id={`${id}-panel`} tabIndex={-1} className="mt-2 rounded-lg border border-rule bg-card p-4 shadow-leaf outline-none">
          <GardenSettings compact headingLevel={3} />
          <Button variant="quiet" size="sm" className="mt-3" onClick={close}>
            Close
          </Button>
        </div>
      )}
    </div>
  );
}
