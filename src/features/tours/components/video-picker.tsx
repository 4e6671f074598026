import { useId, useRef, useState, type DragEvent } from 'react';
import { buttonClasses } from '@/components/button';
import { formatBytes } from '../lib/media-format';

/** File types offered in the chooser; the server decides by looking inside the file, not by its name. */
const ACCEPT = 'video/*,.mp4,.m4v,.mov,.mkv,.webm,.avi';

/** Props of VideoPicker. */
export interface VideoPickerProps {
  file: File | null;
  onFile: (file: File | null) => void;
  error?: string;
  disabled?: boolean;
  label?: string;
}

/**
 * Picks the video to upload: a real file input (keyboard and screen readers) inside a zone that
 * also takes a dropped file.
 */
export function VideoPicker({ file, onFile, error, disabled = false, label = 'Video file' }: VideoPickerProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  // dragenter/dragleave also fire for the zone's children; counting them keeps the highlight steady.
  const depth = useRef(0);

  const onEnter = (event: DragEvent<HTMLDivElement>) => {
    if (disabled) return;
    event.preventDefault();
    depth.current += 1;
    setOver(true);
  };
  const onLeave = (event: DragEvent<HTMLDivElement>) => {
    if (disabled) return;
    event.preventDefault();
    depth.current = Math.max(0, depth.current - 1);
    if (depth.current === 0) setOver(false);
  };
  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    if (disabled) return;
    event.preventDefault();
    depth.current = 0;
    setOver(false);
    const dropped = event.dataTransfer.files[0];
    if (dropped) onFile(dropped);
  };

  return (
    <div className="space-y-2">
      <p id={`${id}-label`} className="font-bold">
        {label}
      </p>
      <div
        onDragEnter={onEnter}
        // Needed for the drop to be allowed at all.
        onDragOver={(e) => !disabled && e.preventDefault()}
        onDragLeave={onLeave}
        onDrop={onDrop}
        className={
          'flex flex-col items-center gap-3 rounded-lg border-2 border-dashed px-4 py-8 text-center transition-colors ' +
          (over ? 'border-moss bg-moss-wash' : error ? 'border-maple bg-card' : 'border-edge bg-card')
        }
      >
        <svg viewBox="0 0 48 48" className="size-12 text-moss" aria-hidden="true">
          <rect x="5" y="11" width="30" height="26" rx="4" fill="none" stroke="currentColor" strokeWidth="3" />
          <path d="M35 20l9-5v18l-9-5z" fill="currentColor" />
          <path d="M20 31V19m0 0l-5 5m5-5l5 5" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
        <p className="font-bold">Drop a video file here</p>
        <p className="text-sm text-ink-soft">or</p>
        <input
          ref={input}
          id={id}
          type="file"
          accept={ACCEPT}
          disabled={disabled}
          aria-labelledby={`${id}-label ${id}-button`}
          aria-describedby={[hintId, error ? errorId : null].filter(Boolean).join(' ')}
          aria-invalid={error ? true : undefined}
          className="peer sr-only"
          onChange={(event) => {
            onFile(event.currentTarget.files?.[0] ?? null);
          }}
        />
        <label
          id={`${id}-button`}
          htmlFor={id}
          className={buttonClasses(
            'secondary',
            'md',
            'cursor-pointer peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus peer-disabled:cursor-not-allowed peer-disabled:opacity-60',
          )}
        >
          Choose a video file
        </label>
        <p id={hintId} className="max-w-md text-sm text-ink-soft">
          MP4, MOV, MKV or WebM straight from your camera or phone. Grovewalk checks the file, then makes versions for phones and
          large screens.
        </p>
      </div>
      {file && (
        <p className="flex flex-wrap items-center gap-x-3 gap-y-1 rounded-md bg-moss-wash px-3 py-2 text-sm">
          <span>
            Chosen: <strong className="break-all">{file.name}</strong> ({formatBytes(file.size)})
          </span>
          {!disabled && (
            <button
              type="button"
              className="rounded px-1 font-bold text-moss underline hover:text-moss-deep"
              onClick={() => {
                if (input.current) input.current.value = '';
                onFile(null);
              }}
            >
              Choose another
            </button>
          )}
        </p>
      )}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-bold text-maple">
          <span aria-hidden="true">!</span>
          <span>
            <span className="sr-only">Error: </span>
            {error}
          </span>
        </p>
      )}
    </div>
  );
}
