import { formatNameParts } from '../../../shared/names/cultivar-name';
import type { StopDto } from '../../../shared/schemas/stops';
import type { Cultivar } from '../../db/entities/cultivar.entity';
import type { Stop } from '../../db/entities/stop.entity';
import { namePartsOf, type NamePartColumns } from '../cultivars/cultivar.presenter';

/** The cultivar as a stop shows it: enough for the trail, the chapter title and a link. */
export function presentStopCultivar(c: Pick<Cultivar, 'id' | 'acceptedName' | 'slug' | 'fictional' | NamePartColumns>): NonNullable<StopDto['cultivar']> {
  return { id: c.id, acceptedName: c.acceptedName, nameSegments: formatNameParts(namePartsOf(c)), slug: c.slug, fictional: c.fictional };
}

/** A stop with its linked record (loaded through the `cultivar` relation). */
export function presentStop(stop: Stop): StopDto {
  return {
    id: stop.id,
    tourId: stop.tourId,
    startMs: stop.startMs,
    endMs: stop.endMs,
    title: stop.title,
    cultivar: stop.cultivar ? presentStopCultivar(stop.cultivar) : null,
  };
}

/** What the chapters track calls a stop: its title, else the record's accepted name. */
export function chapterTitle(stop: Stop): string {
  return stop.title.trim() || stop.cultivar?.acceptedName || 'Unidentified tree';
}
