import { describe, expect, it } from 'vitest';
import { nextSpeed, PLAYBACK_SPEEDS, playerActionForKey, seekTarget, SHORTCUT_HELP, speedLabel } from '@/features/tours/lib/player-keys';

// Key names are the values of KeyboardEvent.key in the W3C "UI Events KeyboardEvent key Values"
// specification (" " for the space bar, "ArrowLeft", "Home"…). The choice of letters is the
// tours brief's; leaving Space to focused buttons and arrows to sliders follows the WAI-ARIA
// Authoring Practices keyboard patterns for button and slider.

describe('playerActionForKey', () => {
  it('maps the brief’s keys', () => {
    expect(playerActionForKey({ key: ' ' })).toEqual({ kind: 'toggle-play' });
    expect(playerActionForKey({ key: 'k' })).toEqual({ kind: 'toggle-play' });
    expect(playerActionForKey({ key: 'ArrowLeft' })).toEqual({ kind: 'seek', by: -5 });
    expect(playerActionForKey({ key: 'ArrowRight' })).toEqual({ kind: 'seek', by: 5 });
    expect(playerActionForKey({ key: 'j' })).toEqual({ kind: 'seek', by: -10 });
    expect(playerActionForKey({ key: 'L' })).toEqual({ kind: 'seek', by: 10 });
    expect(playerActionForKey({ key: 'm' })).toEqual({ kind: 'toggle-mute' });
    expect(playerActionForKey({ key: 'f' })).toEqual({ kind: 'toggle-fullscreen' });
    expect(playerActionForKey({ key: '>' })).toEqual({ kind: 'speed', step: 1 });
    expect(playerActionForKey({ key: '<' })).toEqual({ kind: 'speed', step: -1 });
    expect(playerActionForKey({ key: 'c' })).toEqual({ kind: 'toggle-captions' });
  });

  it('leaves browser and assistive-technology commands alone', () => {
    expect(playerActionForKey({ key: 'f', ctrlKey: true })).toBeNull();
    expect(playerActionForKey({ key: 'k', metaKey: true })).toBeNull();
    expect(playerActionForKey({ key: 'ArrowLeft', altKey: true })).toBeNull();
    expect(playerActionForKey({ key: 'Tab' })).toBeNull();
    expect(playerActionForKey({ key: 'Enter' })).toBeNull();
  });

  it('lets a focused button take Space and a focused slider take the arrows', () => {
    expect(playerActionForKey({ key: ' ', targetTag: 'BUTTON' })).toBeNull();
    expect(playerActionForKey({ key: ' ', targetTag: 'DIV', targetRole: 'button' })).toBeNull();
    expect(playerActionForKey({ key: 'k', targetTag: 'BUTTON' })).toEqual({ kind: 'toggle-play' });
    expect(playerActionForKey({ key: 'ArrowRight', targetTag: 'DIV', targetRole: 'slider' })).toBeNull();
    expect(playerActionForKey({ key: 'l', targetTag: 'DIV', targetRole: 'slider' })).toEqual({ kind: 'seek', by: 10 });
  });

  it('never takes keys typed into a field', () => {
    expect(playerActionForKey({ key: 'k', targetTag: 'INPUT' })).toBeNull();
    expect(playerActionForKey({ key: ' ', targetTag: 'select' })).toBeNull();
  });

  it('documents every key it handles in the help table', () => {
    const listed = SHORTCUT_HELP.flatMap((row) => row.keys);
    for (const key of ['Space', 'K', '←', '→', 'J', 'L', 'M', 'F', '<', '>', 'C', 'Home', 'End']) expect(listed).toContain(key);
  });
});

describe('speed steps (0.5× to 2×, the brief’s range)', () => {
  it('steps through the list and stops at the ends', () => {
    expect(PLAYBACK_SPEEDS[0]).toBe(0.5);
    expect(PLAYBACK_SPEEDS[PLAYBACK_SPEEDS.length - 1]).toBe(2);
    expect(nextSpeed(1, 1)).toBe(1.25);
    expect(nextSpeed(1, -1)).toBe(0.75);
    expect(nextSpeed(2, 1)).toBe(2);
    expect(nextSpeed(0.5, -1)).toBe(0.5);
  });

  it('moves an off-list speed to the nearest listed one in the asked direction', () => {
    expect(nextSpeed(1.1, 1)).toBe(1.25);
    expect(nextSpeed(1.1, -1)).toBe(1);
    expect(nextSpeed(3, -1)).toBe(2);
  });

  it('labels normal speed in words', () => {
    expect(speedLabel(1)).toBe('Normal');
    expect(speedLabel(1.5)).toBe('1.5×');
  });
});

describe('seekTarget', () => {
  it('stays within 0 and the length', () => {
    expect(seekTarget(3, -5, 60)).toBe(0);
    expect(seekTarget(58, 5, 60)).toBe(60);
    expect(seekTarget(10, 10, 60)).toBe(20);
    expect(seekTarget(10, 10, Number.NaN)).toBe(20);
  });
});
