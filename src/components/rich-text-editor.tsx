import { EditorContent, useEditor, useEditorState, type Editor } from '@tiptap/react';
import StarterKit from '@tiptap/starter-kit';
import { useId, useRef, useState, type ReactNode } from 'react';
import { Button } from '@/components/button';
import { linkTarget } from '@/lib/link-target';
import { richTextClasses } from '@/lib/rich-text';

/** Props of RichTextEditor; the label and hint live outside it so the form controls the wording. */
export interface RichTextEditorProps {
  initialHtml: string;
  onChange: (html: string) => void;
  labelId: string;
  describedBy?: string;
  invalid?: boolean;
}

function ToolButton({ label, pressed, disabled, onClick, children }: { label: string; pressed?: boolean; disabled?: boolean; onClick: () => void; children: ReactNode }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      aria-pressed={pressed}
      disabled={disabled}
      // Keep the text selection: a mouse press on the button must not move focus out of the editor first.
      onMouseDown={(event) => event.preventDefault()}
      onClick={onClick}
      className={
        'grid size-9 place-items-center rounded-md font-ui text-sm font-bold disabled:cursor-not-allowed disabled:opacity-40 ' +
        (pressed ? 'bg-moss text-card' : 'text-ink hover:bg-bark-wash')
      }
    >
      {children}
    </button>
  );
}

function LinkForm({ editor, onClose }: { editor: Editor; onClose: () => void }) {
  const id = useId();
  const [value, setValue] = useState<string>(() => (editor.getAttributes('link').href as string | undefined) ?? '');
  const [error, setError] = useState<string | null>(null);
  const hasLink = editor.isActive('link');

  const apply = () => {
    const href = linkTarget(value);
    if (!href) {
      setError('Type a web address such as https://example.org, or an e-mail address starting with mailto:.');
      return;
    }
    editor.chain().focus().extendMarkRange('link').setLink({ href }).run();
    onClose();
  };

  return (
    <div
      className="flex flex-wrap items-end gap-2 border-b border-rule bg-paper px-3 py-2"
      onKeyDown={(event) => {
        if (event.key === 'Escape') {
          event.preventDefault();
          editor.commands.focus();
          onClose();
        }
      }}
    >
      <div className="min-w-0 flex-1">
        <label htmlFor={id} className="block text-sm font-bold">
          Link address
        </label>
        <input
          id={id}
          autoFocus
          value={value}
          onChange={(e) => {
            setValue(e.target.value);
            setError(null);
          }}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              apply();
            }
          }}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          placeholder="https://"
          className="mt-1 block w-full rounded-md border border-edge bg-card px-2 py-1.5 text-sm"
        />
        {error && (
          <p id={`${id}-error`} className="mt-1 text-sm font-bold text-maple">
            {error}
          </p>
        )}
      </div>
      <Button size="sm" onClick={apply}>
        Apply link
      </Button>
      {hasLink && (
        <Button
          size="sm"
          variant="secondary"
          onClick={() => {
            editor.chain().focus().extendMarkRange('link').unsetLink().run();
            onClose();
          }}
        >
          Remove link
        </Button>
      )}
      <Button
        size="sm"
        variant="quiet"
        onClick={() => {
          editor.commands.focus();
          onClose();
        }}
      >
        Cancel
      </Button>
    </div>
  );
}

/**
 * The rich-text editor (Tiptap) for tour descriptions and record notes: paragraphs, bold, italic,
 * lists, links, undo. Loaded on its own when a form that needs it opens, so visitors who only
 * watch or read never download it. The server cleans the HTML again with its allow-list, so this
 * is a convenience, not a safeguard.
 */
export function RichTextEditor({ initialHtml, onChange, labelId, describedBy, invalid }: RichTextEditorProps) {
  const [linkOpen, setLinkOpen] = useState(false);
  const onChangeRef = useRef(onChange);
  onChangeRef.current = onChange;

  const editor = useEditor({
    extensions: [
      StarterKit.configure({
        heading: { levels: [2, 3] },
        codeBlock: false,
        code: false,
        horizontalRule: false,
        link: { openOnClick: false, autolink: true, defaultProtocol: 'https', protocols: ['http', 'https', 'mailto'] },
      }),
    ],
    content: initialHtml || '',
    editorProps: {
      attributes: {
        role: 'textbox',
        'aria-multiline': 'true',
        'aria-labelledby': labelId,
        ...(describedBy ? { 'aria-describedby': describedBy } : {}),
        ...(invalid ? { 'aria-invalid': 'true' } : {}),
        class: `min-h-40 px-3 py-3 outline-none ${richTextClasses}`,
      },
    },
    onUpdate: ({ editor: e }) => onChangeRef.current(e.isEmpty ? '' : e.getHTML()),
  });

  const state = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      bullet: e.isActive('bulletList'),
      ordered: e.isActive('orderedList'),
      link: e.isActive('link'),
      canUndo: e.can().undo(),
      canRedo: e.can().redo(),
    }),
  });

  return (
    <div
      className={`overflow-hidden rounded-md border bg-card focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-focus ${invalid ? 'border-2 border-maple' : 'border-edge'}`}
    >
      <div role="group" aria-label="Formatting" className="flex flex-wrap gap-1 border-b border-rule bg-bark-wash/60 px-2 py-1.5">
        <ToolButton label="Bold (Ctrl+B)" pressed={state.bold} onClick={() => editor.chain().focus().toggleBold().run()}>
          <span className="font-bold">B</span>
        </ToolButton>
        <ToolButton label="Italic (Ctrl+I)" pressed={state.italic} onClick={() => editor.chain().focus().toggleItalic().run()}>
          <span className="font-serif italic">I</span>
        </ToolButton>
        <span aria-hidden="true" className="mx-1 w-px self-stretch bg-rule" />
        <ToolButton label="Bulleted list (Ctrl+Shift+8)" pressed={state.bullet} onClick={() => editor.chain().focus().toggleBulletList().run()}>
          <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
            <circle cx="4" cy="5" r="1.6" fill="currentColor" />
            <circle cx="4" cy="10" r="1.6" fill="currentColor" />
            <circle cx="4" cy="15" r="1.6" fill="currentColor" />
            <path d="M8 5h9M8 10h9M8 15h9" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
          </svg>
        </ToolButton>
        <ToolButton label="Numbered list (Ctrl+Shift+7)" pressed={state.ordered} onClick={() => editor.chain().focus().toggleOrderedList().run()}>
          <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
            <text x="1" y="7.5" fontSize="6.5" fill="currentColor" fontFamily="system-ui">1</text>
            <text x="1" y="12.5" fontSize="6.5" fill="currentColor" fontFamily="system-ui">2</text>
            <text x="1" y="17.5" fontSize="6.5" fill="currentColor" fontFamily="system-ui">3</text>
            <path d="M8 5h9M8 10h9M8 15h9" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
          </svg>
        </ToolButton>
        <ToolButton label={state.link ? 'Change link' : 'Add link'} pressed={state.link || linkOpen} onClick={() => setLinkOpen((open) => !open)}>
          <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
            <path d="M8.5 11.5l3-3M7 9.5l-2 2a2.8 2.8 0 004 4l2-2M13 10.5l2-2a2.8 2.8 0 00-4-4l-2 2" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
          </svg>
        </ToolButton>
        <span aria-hidden="true" className="mx-1 w-px self-stretch bg-rule" />
        <ToolButton label="Undo (Ctrl+Z)" disabled={!state.canUndo} onClick={() => editor.chain().focus().undo().run()}>
          <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
            <path d="M7 5L3 9l4 4M3.5 9H12a5 5 0 010 10h-2" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
          </svg>
        </ToolButton>
        <ToolButton label="Redo (Ctrl+Shift+Z)" disabled={!state.canRedo} onClick={() => editor.chain().focus().redo().run()}>
          <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
            <path d="M13 5l4 4-4 4M16.5 9H8a5 5 0 000 10h2" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
          </svg>
        </ToolButton>
      </div>
      {linkOpen && <LinkForm editor={editor} onClose={() => setLinkOpen(false)} />}
      <EditorContent editor={editor} />
    </div>
  );
}

export default RichTextEditor;
