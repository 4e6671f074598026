import type { ReactNode } from 'react';
import { zoneBandText } from '@/features/preferences/lib/reader-prefs';
import { isUsdaZone } from '@shared/hardiness';
import { SEASONS, type TraitProfile } from '@shared/traits';
import type { UnitSystem } from '@shared/units';
import {
  BARK_LABELS,
  CONTAINER_LABELS,
  GROWTH_LABELS,
  HABIT_LABELS,
  heightClassLabel,
  heightText,
  joinList,
  leafFormLong,
  leafSizeLabel,
  lobeText,
  SUN_LABELS,
} from '@/lib/trait-words';
import { ColourSwatches } from './colour-swatches';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="border-t border-rule py-2 sm:grid sm:grid-cols-[12rem_1fr] sm:gap-4">
      <dt className="font-ui text-sm font-bold text-ink-soft">{term}</dt>
      <dd className="mt-0.5 sm:mt-0">{children}</dd>
    </div>
  );
}

function zoneTitle(zone: string): string | undefined {
  return isUsdaZone(zone) ? `Zone ${zone}: average coldest night ${zoneBandText(zone)}` : undefined;
}

/**
 * What the record says about how the tree grows, in the reader's units. Missing traits are left
 * out rather than shown as "none", because a missing trait means "not recorded".
 */
export function TraitList({ traits, system }: { traits: TraitProfile | null; system: UnitSystem }) {
  if (!traits || Object.keys(traits).length === 0) return <p className="text-ink-soft">No traits are recorded for this cultivar yet.</p>;
  const t = traits;
  return (
    <dl className="border-b border-rule">
      {t.leafForm && <Item term="Leaf form">{leafFormLong(t.leafForm)}</Item>}
      {t.lobeCount && <Item term="Number of lobes">{lobeText(t.lobeCount)}</Item>}
      {t.leafSize && <Item term="Leaf size">{leafSizeLabel(t.leafSize, system)}</Item>}
      {t.colours &&
        SEASONS.filter((s) => t.colours?.[s]?.length).map((s) => (
          <Item key={s} term={`Leaf colour in ${s}`}>
            <ColourSwatches ids={t.colours![s]!} />
          </Item>
        ))}
      {t.bark?.length ? <Item term="Bark">{joinList(t.bark.map((b) => BARK_LABELS[b]))}</Item> : null}
      {t.habit?.length ? <Item term="Habit">{joinList(t.habit.map((h) => HABIT_LABELS[h]))}</Item> : null}
      {(t.heightM || t.heightClass) && (
        <Item term="Height at maturity">
          {t.heightM ? heightText(t.heightM, system) : heightClassLabel(t.heightClass!, system)}
          <span className="block text-sm text-ink-soft">Often smaller in a container; an estimate, not a promise.</span>
        </Item>
      )}
      {t.growthRate && <Item term="Growth rate">{GROWTH_LABELS[t.growthRate]}</Item>}
      {t.sunTolerance?.length ? <Item term="Sun or shade">{joinList(t.sunTolerance.map((s) => SUN_LABELS[s]))}</Item> : null}
      {t.containerSuitability && <Item term="In a container">{CONTAINER_LABELS[t.containerSuitability]}</Item>}
      {t.hardiness && (
        <Item term="Hardiness (USDA zones)">
          <span className="tabular-nums">
            <abbr title={zoneTitle(t.hardiness.min)} className="no-underline">
              {t.hardiness.min}
            </abbr>{' '}
            to{' '}
            <abbr title={zoneTitle(t.hardiness.max)} className="no-underline">
              {t.hardiness.max}
            </abbr>
          </span>
          {isUsdaZone(t.hardiness.min) && (
            <span className="block text-sm text-ink-soft">Coldest: zone {t.hardiness.min}, average coldest night {zoneBandText(t.hardiness.min)}.</span>
          )}
        </Item>
      )}
    </dl>
  );
}
