import { useId, useState } from 'react';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { errorMessage } from '@/lib/api';
import { RichTextField } from '@/components/rich-text-field';
import { richTextClasses } from '@/lib/rich-text';
import { useSavePairNote, type PairNote as PairNoteDto } from '../api/compare-api';

/** Props of PairNote: one pair, its stored note (if any) and whether this reader may edit it. */
export interface PairNoteProps {
  aId: number;
  bId: number;
  title: string;
  note: PairNoteDto | undefined;
  canEdit: boolean;
}

/**
 * "How to tell them apart" for one pair. Authors and above edit it with the rich-text editor. The
 * server sanitises what is stored, so the note is shown as it comes.
 */
export function PairNote({ aId, bId, title, note, canEdit }: PairNoteProps) {
  const id = useId();
  const save = useSavePairNote();
  const [draft, setDraft] = useState<string | null>(null);
  const editing = draft !== null;

  return (
    <section aria-labelledby={`${id}-h`} className="rounded-lg border border-rule bg-card p-4 shadow-leaf">
      <h3 id={`${id}-h`} className="text-lg">
        {title}
      </h3>
      {editing ? (
        <form
          className="mt-2 space-y-3"
          onSubmit={(e) => {
            e.preventDefault();
            save.mutate({ aId, bId, notesHtml: draft }, { onSuccess: () => setDraft(null) });
          }}
        >
          <RichTextField
            label="How to tell them apart"
            hint="What to look at, and when in the year it shows. Bold, italic, lists and links are kept."
            initialHtml={note?.notesHtml ?? ''}
            onChange={setDraft}
          />
          <FormError message={save.isError ? errorMessage(save.error) : null} />
          <div className="flex flex-wrap gap-3">
            <Button type="submit" busy={save.isPending}>
              Save the note
            </Button>
            <Button variant="secondary" onClick={() => setDraft(null)} disabled={save.isPending}>
              Cancel
            </Button>
          </div>
        </form>
      ) : (
        <>
          {note?.notesHtml ? (
            // Sanitised by the server on save and on the way out.
            <div className={`mt-2 ${richTextClasses}`} dangerouslySetInnerHTML={{ __html: note.notesHtml }} />
          ) : (
            <p className="mt-2 text-ink-soft">No note for this pair yet.{canEdit ? '' : ' Authors of the club can add one.'}</p>
          )}
          {canEdit && (
            <Button variant="secondary" size="sm" className="mt-3" onClick={() => setDraft(note?.notesHtml ?? '')}>
              {note?.notesHtml ? 'Edit the note' : 'Write a note'}
            </Button>
          )}
        </>
      )}
    </section>
  );
}
