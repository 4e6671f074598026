import { useRef, useState } from 'react';
import { Link } from 'react-router';
import { Button } from '@/components/button';
import { useTrack, useTracks } from '../api/spelling-api';
import { cueForSelection } from '../lib/fix-words';
import { FlagNameDialog, type FlaggedCue } from './flag-name-dialog';

function currentSelection(): string {
  return typeof window === 'undefined' ? '' : (window.getSelection()?.toString() ?? '');
}

/**
 * "Flag a misspelt name" for a transcript page: the reader selects the misspelt words in the
 * transcript and presses the button; the caption holding them is found in the track of the
 * language shown, and the flag dialog opens with the words filled in. Without a usable selection
 * it says how, and links to the caption-by-caption list.
 */
export function TranscriptFlagButton({ tourId, lang }: { tourId: number; lang: string | null | undefined }) {
  const tracks = useTracks(tourId);
  const track = tracks.data?.find((t) => t.lang === lang) ?? tracks.data?.[0] ?? null;
  const detail = useTrack(track?.id ?? null);
  const [cue, setCue] = useState<FlaggedCue | null>(null);
  const [help, setHelp] = useState(false);
  const selection = useRef('');

  const open = () => {
    const sel = selection.current || currentSelection();
    const found = detail.data && track ? cueForSelection(detail.data.cues, sel) : null;
    if (found && track) {
      setHelp(false);
      setCue({ trackId: track.id, startMs: found.startMs, text: found.text });
    } else {
      setHelp(true);
    }
  };

  if (!track) return null;
  return (
    <>
      <Button
        size="sm"
        variant="secondary"
        disabled={!detail.data}
        onPointerDown={() => (selection.current = currentSelection())}
        onKeyDown={() => (selection.current = currentSelection())}
        onClick={open}
      >
        Flag a misspelt name
      </Button>
      {help && (
        <p role="status" className="w-full text-sm">
          Select the misspelt words in the transcript first, then press “Flag a misspelt name”. Or{' '}
          <Link to={`/tours/${tourId}/names`}>choose the caption from the list</Link>.
        </p>
      )}
      <FlagNameDialog cue={cue} selection={selection.current} onClose={() => setCue(null)} />
    </>
  );
}
