import type { TourDto, UpdateTourInput } from '@shared/schemas/tours';

/** The values the details form holds, before they are checked with the shared schema. */
export interface DetailsFormValues {
  title: string;
  garden: string;
  filmedOn: string;
  descriptionHtml: string;
}

/**
 * Form values in the shape the shared schema checks: an empty date means "not known" (null),
 * and an editor's empty document (a lone empty paragraph) is no description at all.
 */
export function detailsInputFrom(values: DetailsFormValues): Record<string, unknown> {
  const description = values.descriptionHtml.trim();
  return {
    title: values.title,
    garden: values.garden,
    filmedOn: values.filmedOn.trim() === '' ? null : values.filmedOn.trim(),
    descriptionHtml: /^(<p>\s*<\/p>)*$/.test(description) ? '' : description,
  };
}

/** Only the fields that differ from the saved tour, so saving nothing sends nothing. */
export function changedDetails(tour: Pick<TourDto, 'title' | 'garden' | 'filmedOn' | 'descriptionHtml'>, input: UpdateTourInput): UpdateTourInput {
  const patch: UpdateTourInput = {};
  if (input.title !== undefined && input.title !== tour.title) patch.title = input.title;
  if (input.garden !== undefined && input.garden !== tour.garden) patch.garden = input.garden;
  if (input.filmedOn !== undefined && input.filmedOn !== tour.filmedOn) patch.filmedOn = input.filmedOn;
  if (input.descriptionHtml !== undefined && input.descriptionHtml !== tour.descriptionHtml) patch.descriptionHtml = input.descriptionHtml;
  return patch;
}
