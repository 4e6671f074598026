import { useId, useState, type KeyboardEvent } from 'react';
import { formatNameParts } from '@shared/names/cultivar-name';
import type { CultivarDetail } from '@shared/schemas/cultivars';
import { Button } from '@/components/button';
import { CultivarName } from '@/components/cultivar-name';
import { FormError } from '@/components/form-error';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { useProposeRecord } from '../api/stops-api';

/** Props of ProposeRecordForm. */
export interface ProposeRecordFormProps {
  /** What the author had typed in the picker; it starts the epithet field. */
  typed: string;
  /** Called with the new record; `usable` is false while it waits for a moderator. */
  onDone: (record: CultivarDetail, usable: boolean) => void;
  onCancel: () => void;
}

/**
 * A small form for a record that does not exist yet: genus, species, Group and epithet. The server
 * checks the name against the writing rules for cultivated plant names and answers per field; a
 * proposal by an author waits for a moderator before stops can link to it. Not a <form> element,
 * because it sits inside the stop's form.
 */
export function ProposeRecordForm({ typed, onDone, onCancel }: ProposeRecordFormProps) {
  const id = useId();
  const propose = useProposeRecord();
  const [values, setValues] = useState({ genus: 'Acer', species: 'palmatum', groupName: '', epithet: typed.replace(/^['‘’"]+|['‘’"]+$/g, '') });
  const fields = isApiError(propose.error) ? propose.error.fields : {};

  const send = () => {
    propose.mutate(
      { genus: values.genus.trim(), species: values.species.trim() || null, groupName: values.groupName.trim() || null, epithet: values.epithet.trim() },
      { onSuccess: (record) => onDone(record, record.status === 'approved') },
    );
  };
  const onEnter = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.key === 'Enter' && event.target instanceof HTMLInputElement) {
      event.preventDefault();
      send();
    }
  };
  const field = (name: keyof typeof values) => ({
    name,
    value: values[name],
    onChange: (e: { target: { value: string } }) => setValues((v) => ({ ...v, [name]: e.target.value })),
    error: fields[name],
  });

  return (
    <div role="group" aria-labelledby={`${id}-title`} onKeyDown={onEnter} className="space-y-3 rounded-md border border-rule bg-paper p-4">
      <h4 id={`${id}-title`} className="font-bold">
        Propose a new cultivar record
      </h4>
      <p className="text-sm text-ink-soft">
        Write the name the way the record should print it. A moderator checks new records before stops can link to them; until then the stop stays
        “Unidentified tree”.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Genus" {...field('genus')} hint="Capital first letter, e.g. Acer." maxLength={60} />
        <TextField label="Species" {...field('species')} hint="Lower case, e.g. palmatum. May be left empty." maxLength={60} />
        <TextField label="Group (optional)" {...field('groupName')} hint="e.g. Dissectum Group." maxLength={80} />
        <TextField label="Cultivar epithet" {...field('epithet')} hint="Without quotation marks; each word capitalised." maxLength={80} />
      </div>
      {values.epithet.trim() && (
        <p className="text-sm">
          <span className="text-ink-soft">Will print as: </span>
          <CultivarName
            record={{
              acceptedName: '',
              nameSegments: formatNameParts({ genus: values.genus, species: values.species, group: values.groupName, epithet: values.epithet }),
            }}
          />
        </p>
      )}
      <FormError message={propose.isError ? errorMessage(propose.error) : null} />
      <div className="flex flex-wrap gap-3">
        <Button size="sm" busy={propose.isPending} onClick={send}>
          Send the proposal
        </Button>
        <Button size="sm" variant="secondary" onClick={onCancel} disabled={propose.isPending}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
