import { useEffect, useId, useState } from 'react';
import { planSpeech } from '@/lib/speech';

function speechAvailable(): boolean {
  return typeof window !== 'undefined' && 'speechSynthesis' in window && typeof window.SpeechSynthesisUtterance === 'function';
}

/** The voices the browser offers; some browsers fill the list a moment after the page opens. */
function useVoices(enabled: boolean): SpeechSynthesisVoice[] {
  const [voices, setVoices] = useState<SpeechSynthesisVoice[]>(() => (enabled ? window.speechSynthesis.getVoices() : []));
  useEffect(() => {
    if (!enabled) return;
    const synth = window.speechSynthesis;
    const update = () => setVoices(synth.getVoices());
    update();
    synth.addEventListener?.('voiceschanged', update);
    return () => synth.removeEventListener?.('voiceschanged', update);
  }, [enabled]);
  return voices;
}

/** Props of HearItButton: the name to say and what the page knows about how it sounds. */
export interface HearItButtonProps {
  epithet: string;
  /** True for romanised Japanese (Hepburn) names, which a Japanese voice reads best. */
  hepburn: boolean;
  respelling: string | null;
  /** Read out as part of the button's name, e.g. "Hear it: 'Sora-no-hane'". */
  label?: string;
  size?: 'md' | 'sm';
}

/**
 * Says a cultivar name with the browser's own speech synthesis (nothing is sent anywhere). Where
 * the browser has no speech synthesis the button stays visible but disabled, with the reason.
 */
export function HearItButton({ epithet, hepburn, respelling, label, size = 'md' }: HearItButtonProps) {
  const available = speechAvailable();
  const voices = useVoices(available);
  const noteId = useId();
  const [note, setNote] = useState<string | null>(null);
  const [speaking, setSpeaking] = useState(false);

  useEffect(() => () => {
    if (speechAvailable()) window.speechSynthesis.cancel();
  }, []);

  const say = () => {
    const plan = planSpeech({ epithet, hepburn, respelling }, voices);
    const synth = window.speechSynthesis;
    synth.cancel();
    const utterance = new window.SpeechSynthesisUtterance(plan.text);
    if (plan.lang) utterance.lang = plan.lang;
    if (plan.voice) utterance.voice = plan.voice;
    // A little slower than conversation, so each syllable can be heard.
    utterance.rate = 0.85;
    utterance.onend = () => setSpeaking(false);
    utterance.onerror = () => {
      setSpeaking(false);
      setNote('The browser could not read the name aloud. Check that sound is on, or use the written guide.');
    };
    setNote(plan.note);
    setSpeaking(true);
    synth.speak(utterance);
  };

  const pad = size === 'sm' ? 'min-h-9 px-3 py-1' : 'min-h-11 px-4 py-2';
  return (
    <div className="inline-flex flex-col items-start gap-1">
      <button
        type="button"
        onClick={say}
        disabled={!available}
        aria-describedby={noteId}
        aria-label={label ?? `Hear it: ${epithet}`}
        className={`inline-flex items-center gap-2 rounded-md border border-moss bg-card font-ui text-sm font-bold text-moss hover:bg-moss-wash hover:text-moss-deep disabled:cursor-not-allowed disabled:border-edge disabled:text-ink-soft disabled:hover:bg-card ${pad}`}
      >
        <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
          <path d="M3 8h3l4-3v10l-4-3H3z" fill="currentColor" />
          <path d="M13 7.5a3.5 3.5 0 0 1 0 5M15.5 5a7 7 0 0 1 0 10" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
        </svg>
        {speaking ? 'Saying it…' : 'Hear it'}
      </button>
      <span id={noteId} role="status" className="font-ui text-xs text-ink-soft">
        {available ? note : 'This browser cannot read text aloud, so “Hear it” is off here. Use the written guide.'}
      </span>
    </div>
  );
}
