import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { USDA_ZONES } from '@shared/hardiness';
import { INFRASPECIFIC_RANKS } from '@shared/names/cultivar-name';
import type { CultivarFull, CultivarInput } from '@shared/schemas/cultivars';
import {
  BARKS,
  CONTAINER_SUITABILITIES,
  GROWTH_RATES,
  HABITS,
  HEIGHT_CLASSES,
  LEAF_FORMS,
  LEAF_SIZES,
  PLANT_COLOURS,
  SEASONS,
  SUN_TOLERANCES,
} from '@shared/traits';
import type { UnitSystem } from '@shared/units';
import { Button } from '@/components/button';
import { CultivarName } from '@/components/cultivar-name';
import { FormError } from '@/components/form-error';
import { RichTextField } from '@/components/rich-text-field';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import {
  BARK_LABELS,
  CONTAINER_LABELS,
  GROWTH_LABELS,
  HABIT_LABELS,
  heightClassLabel,
  leafFormLong,
  leafSizeLabel,
  SUN_LABELS,
} from '@/lib/trait-words';
import { EMPTY_NAME, nameInputOf, nameProblemsByField, namePreview, type NameFormValues } from '../lib/name-form';
import { colourField, fieldSourceOf, heightForForm, traitsFromForm } from '../lib/trait-form';

const inputClass = 'mt-1 block w-full rounded-md border bg-card px-3 py-2 text-base font-normal';

function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="mt-1 text-sm font-bold text-maple">
      <span className="sr-only">Error: </span>
      {message}
    </p>
  );
}

function SelectField({ label, name, defaultValue, error, children }: { label: string; name: string; defaultValue?: string; error?: string; children: ReactNode }) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="block font-ui text-sm font-bold">
        {label}
      </label>
      <select id={id} name={name} defaultValue={defaultValue ?? ''} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-e` : undefined} className={`${inputClass} ${error ? 'border-2 border-maple' : 'border-edge'}`}>
        {children}
      </select>
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}

function Checks({ legend, name, options, checked, error }: { legend: string; name: string; options: readonly { value: string; label: ReactNode }[]; checked: readonly string[]; error?: string }) {
  const id = useId();
  return (
    <fieldset aria-describedby={error ? `${id}-e` : undefined}>
      <legend className="font-ui text-sm font-bold">{legend}</legend>
      <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
        {options.map((o) => (
          <label key={o.value} className="inline-flex min-h-9 items-center gap-2">
            <input type="checkbox" name={name} value={o.value} defaultChecked={checked.includes(o.value)} className="size-4 accent-moss" />
            {o.label}
          </label>
        ))}
      </div>
      <FieldError id={`${id}-e`} message={error} />
    </fieldset>
  );
}

function NumberPair({ legend, names, values, unit, errors, step = '1' }: { legend: string; names: [string, string]; values: [string, string]; unit?: string; errors: Record<string, string>; step?: string }) {
  const id = useId();
  const error = errors[names[0]] ?? errors[names[1]];
  return (
    <fieldset aria-describedby={error ? `${id}-e` : undefined}>
      <legend className="font-ui text-sm font-bold">
        {legend}
        {unit ? ` (${unit})` : ''}
      </legend>
      <div className="mt-1 flex items-center gap-2">
        <label className="sr-only" htmlFor={`${id}-a`}>
          {legend}, from
        </label>
        <input id={`${id}-a`} name={names[0]} type="number" min="0" step={step} inputMode="decimal" defaultValue={values[0]} aria-invalid={errors[names[0]] ? true : undefined} className={`${inputClass} mt-0 w-24 border-edge`} />
        <span aria-hidden="true">to</span>
        <label className="sr-only" htmlFor={`${id}-b`}>
          {legend}, to
        </label>
        <input id={`${id}-b`} name={names[1]} type="number" min="0" step={step} inputMode="decimal" defaultValue={values[1]} aria-invalid={errors[names[1]] ? true : undefined} className={`${inputClass} mt-0 w-24 border-edge`} />
      </div>
      <FieldError id={`${id}-e`} message={error} />
    </fieldset>
  );
}

function TraitFields({ initial, system, errors }: { initial: CultivarFull['traits']; system: UnitSystem; errors: Record<string, string> }) {
  const t = initial ?? {};
  return (
    <fieldset className="space-y-4 rounded-lg border border-rule p-4">
      <legend className="px-1 text-lg font-bold">How it grows</legend>
      <p className="text-sm text-ink-soft">Leave anything you do not know empty: empty means “not recorded”.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Leaf form" name="leafForm" defaultValue={t.leafForm} error={errors.leafForm}>
          <option value="">Not recorded</option>
          {LEAF_FORMS.map((f) => (
            <option key={f} value={f}>
              {leafFormLong(f)}
            </option>
          ))}
        </SelectField>
        <SelectField label="Leaf size" name="leafSize" defaultValue={t.leafSize} error={errors.leafSize}>
          <option value="">Not recorded</option>
          {LEAF_SIZES.map((s) => (
            <option key={s} value={s}>
              {leafSizeLabel(s, system)}
            </option>
          ))}
        </SelectField>
        <NumberPair legend="Number of lobes" names={['lobeMin', 'lobeMax']} values={[t.lobeCount ? String(t.lobeCount.min) : '', t.lobeCount ? String(t.lobeCount.max) : '']} errors={errors} />
        <NumberPair
          legend="Height at maturity"
          unit={system === 'imperial' ? 'feet' : 'metres'}
          names={['heightMin', 'heightMax']}
          values={[t.heightM ? heightForForm(t.heightM.min, system) : '', t.heightM ? heightForForm(t.heightM.max, system) : '']}
          errors={errors}
          step="0.1"
        />
        <SelectField label="Height class" name="heightClass" defaultValue={t.heightClass} error={errors.heightClass}>
          <option value="">Not recorded</option>
          {HEIGHT_CLASSES.map((c) => (
            <option key={c} value={c}>
              {heightClassLabel(c, system)}
            </option>
          ))}
        </SelectField>
        <SelectField label="Growth rate" name="growthRate" defaultValue={t.growthRate} error={errors.growthRate}>
          <option value="">Not recorded</option>
          {GROWTH_RATES.map((g) => (
            <option key={g} value={g}>
              {GROWTH_LABELS[g]}
            </option>
          ))}
        </SelectField>
        <SelectField label="In a container" name="container" defaultValue={t.containerSuitability} error={errors.container}>
          <option value="">Not recorded</option>
          {CONTAINER_SUITABILITIES.map((c) => (
            <option key={c} value={c}>
              {CONTAINER_LABELS[c]}
            </option>
          ))}
        </SelectField>
        <div className="grid grid-cols-2 gap-3">
          <SelectField label="Coldest USDA zone" name="zoneMin" defaultValue={t.hardiness?.min} error={errors.zoneMin}>
            <option value="">—</option>
            {USDA_ZONES.map((z) => (
              <option key={z} value={z}>
                {z}
              </option>
            ))}
          </SelectField>
          <SelectField label="Warmest USDA zone" name="zoneMax" defaultValue={t.hardiness?.max} error={errors.zoneMax}>
            <option value="">—</option>
            {USDA_ZONES.map((z) => (
              <option key={z} value={z}>
                {z}
              </option>
            ))}
          </SelectField>
        </div>
      </div>
      {SEASONS.map((season) => (
        <Checks
          key={season}
          legend={`Leaf colour in ${season}`}
          name={colourField(season)}
          checked={t.colours?.[season] ?? []}
          error={errors[colourField(season)]}
          options={PLANT_COLOURS.map((c) => ({
            value: c.id,
            label: (
              <>
                <span aria-hidden="true" className="inline-block size-4 rounded-full border border-edge" style={{ background: 'accentHex' in c ? `linear-gradient(135deg, ${c.hex} 0 55%, ${c.accentHex} 55% 100%)` : c.hex }} />
                {c.label}
              </>
            ),
          }))}
        />
      ))}
      <Checks legend="Bark" name="bark" checked={t.bark ?? []} error={errors.bark} options={BARKS.map((b) => ({ value: b, label: BARK_LABELS[b] }))} />
      <Checks legend="Habit" name="habit" checked={t.habit ?? []} error={errors.habit} options={HABITS.map((h) => ({ value: h, label: HABIT_LABELS[h] }))} />
      <Checks legend="Sun or shade" name="sun" checked={t.sunTolerance ?? []} error={errors.sun} options={SUN_TOLERANCES.map((s) => ({ value: s, label: SUN_LABELS[s] }))} />
    </fieldset>
  );
}

/** Props of RecordForm: a new proposal (no initial record) or a moderator's edit. */
export interface RecordFormProps {
  initial: CultivarFull | null;
  system: UnitSystem;
  submitLabel: string;
  busy: boolean;
  error: unknown;
  onSubmit: (input: CultivarInput) => void;
  onCancel?: () => void;
}

/**
 * The whole record as a form: name parts (checked as they are typed with the shared writing rules,
 * with a live preview), meaning, pronunciation guide, notes (rich text), and the traits.
 */
export function RecordForm({ initial, system, submitLabel, busy, error, onSubmit, onCancel }: RecordFormProps) {
  const id = useId();
  const [name, setName] = useState<NameFormValues>(() =>
    initial
      ? {
          genus: initial.genus,
          species: initial.species ?? '',
          infraspecificRank: initial.infraspecificRank ?? '',
          infraspecificEpithet: initial.infraspecificEpithet ?? '',
          groupName: initial.groupName ?? '',
          epithet: initial.epithet,
        }
      : EMPTY_NAME,
  );
  const [touched, setTouched] = useState(false);
  const [clientErrors, setClientErrors] = useState<Record<string, string>>({});
  // Notes are sent only when edited, so an unchanged record keeps its notes exactly as stored.
  const [notesHtml, setNotesHtml] = useState<string | null>(null);
  const serverFields = isApiError(error) ? error.fields : {};
  const nameErrors = touched ? nameProblemsByField(name) : {};
  const errors: Record<string, string> = { ...serverFields, ...clientErrors, ...nameErrors };

  const setPart = (key: keyof NameFormValues) => (e: { target: { value: string } }) => {
    setName((n) => ({ ...n, [key]: e.target.value }));
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setTouched(true);
    const form = event.currentTarget;
    const data = new FormData(form);
    const problems = nameProblemsByField(name);
    const traits = traitsFromForm(fieldSourceOf(data), system);
    const errs = { ...(traits.ok ? {} : traits.errors) };
    setClientErrors(errs);
    if (Object.keys(problems).length || !traits.ok) {
      const first = Object.keys({ ...problems, ...errs })[0];
      (form.elements.namedItem(first ?? '') as HTMLElement | null)?.focus?.();
      return;
    }
    const input: CultivarInput = {
      ...nameInputOf(name),
      traits: traits.traits,
      meaning: String(data.get('meaning') ?? '').trim() || null,
      pronunciation: String(data.get('pronunciation') ?? '').trim() || null,
      fictional: data.get('fictional') === 'on',
    };
    if (notesHtml !== null) input.notesHtml = notesHtml;
    onSubmit(input);
  };

  const preview = namePreview(name);
  const formError = error ? errorMessage(error) : null;

  return (
    <form onSubmit={submit} noValidate className="space-y-6">
      <FormError message={formError} />
      <fieldset className="space-y-4 rounded-lg border border-rule p-4">
        <legend className="px-1 text-lg font-bold">Name</legend>
        <p className="text-sm text-ink-soft">
          Type the epithet without quotation marks or “cv.”; Grovewalk adds the single quotes. Each word starts with a capital, except particles such as “no”.
        </p>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Genus" name="genus" value={name.genus} onChange={setPart('genus')} error={errors.genus} autoComplete="off" />
          <TextField label="Species (optional)" name="species" value={name.species} onChange={setPart('species')} error={errors.species} autoComplete="off" />
          <div>
            <label htmlFor={`${id}-rank`} className="block font-bold">
              Rank below species (optional)
            </label>
            <select id={`${id}-rank`} name="infraspecificRank" value={name.infraspecificRank} onChange={setPart('infraspecificRank')} className={`${inputClass} ${errors.infraspecificRank ? 'border-2 border-maple' : 'border-edge'}`} aria-invalid={errors.infraspecificRank ? true : undefined} aria-describedby={errors.infraspecificRank ? `${id}-rank-e` : undefined}>
              <option value="">None</option>
              {INFRASPECIFIC_RANKS.map((r) => (
                <option key={r} value={r}>
                  {r}
                </option>
              ))}
            </select>
            <FieldError id={`${id}-rank-e`} message={errors.infraspecificRank} />
          </div>
          <TextField label="Infraspecific epithet (optional)" name="infraspecificEpithet" value={name.infraspecificEpithet} onChange={setPart('infraspecificEpithet')} error={errors.infraspecificEpithet} autoComplete="off" />
          <TextField label="Cultivar Group (optional)" name="groupName" hint="Ends in “Group”, e.g. Dissectum Group." value={name.groupName} onChange={setPart('groupName')} error={errors.groupName} autoComplete="off" />
          <TextField label="Cultivar epithet" name="epithet" value={name.epithet} onChange={setPart('epithet')} onBlur={() => setTouched(true)} error={errors.epithet} autoComplete="off" />
        </div>
        <p className="rounded-md bg-paper px-3 py-2" aria-live="polite">
          <span className="font-ui text-sm font-bold text-ink-soft">Prints as: </span>
          <span className="text-lg">{name.epithet.trim() ? <CultivarName record={{ acceptedName: '', nameSegments: preview }} /> : '…'}</span>
        </p>
      </fieldset>

      <fieldset className="space-y-4 rounded-lg border border-rule p-4">
        <legend className="px-1 text-lg font-bold">Saying and meaning</legend>
        <TextField
          label="Pronunciation guide (optional)"
          name="pronunciation"
          defaultValue={initial?.pronunciation ?? ''}
          hint={initial?.respelling ? `Leave empty to show the generated guide: “${initial.respelling}”.` : 'Leave empty to use the generated guide for romanised Japanese names.'}
          error={errors.pronunciation}
          autoComplete="off"
        />
        <div>
          <label htmlFor={`${id}-meaning`} className="block font-bold">
            What the name means (optional)
          </label>
          <textarea id={`${id}-meaning`} name="meaning" rows={2} defaultValue={initial?.meaning ?? ''} className={`${inputClass} border-edge`} />
          <FieldError id={`${id}-meaning-e`} message={errors.meaning} />
        </div>
      </fieldset>

      <TraitFields initial={initial?.traits ?? null} system={system} errors={errors} />

      <RichTextField
        label="Notes"
        hint="Care, where it grows well, how it differs from look-alikes. Bold, italic, lists and links are kept."
        error={errors.notesHtml}
        initialHtml={initial?.notesHtml ?? ''}
        onChange={setNotesHtml}
      />

      <label className="flex items-start gap-2">
        <input type="checkbox" name="fictional" defaultChecked={initial?.fictional ?? false} className="mt-1.5 size-4 accent-moss" />
        <span>
          <span className="font-bold">Invented for the demo</span>
          <span className="block text-sm text-ink-soft">Marks the record as fictional wherever it is listed.</span>
        </span>
      </label>

      <div className="flex flex-wrap gap-3">
        <Button type="submit" busy={busy}>
          {submitLabel}
        </Button>
        {onCancel && (
          <Button variant="secondary" onClick={onCancel} disabled={busy}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
