import type { PlayerAction } from './player-keys';

/**
 * What the tour page may ask of the loaded player. The player lives in a lazy chunk, so the page
 * talks to it through this small handle instead of importing video.js itself.
 */
export interface PlayerController {
  /** Moves the playhead (seconds), keeping play or pause as it was. */
  seek(seconds: number): void;
  /** The playhead in seconds. */
  currentTime(): number;
  /** Runs a keyboard action as if the key had been pressed on the video. */
  run(action: PlayerAction): void;
  /** Puts keyboard focus on the video, so its keys work at once. */
  focus(): void;
}
