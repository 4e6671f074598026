// WebVTT cue settings ("align:start line:90%"): reading them into layout values and cleaning a
// written settings list so that only valid settings are kept.
//
// Follows W3C WebVTT "parse the WebVTT cue settings" and "parse a percentage string", with one
// deliberate difference taken from the web-platform-tests WebVTT suite (settings-line,
// settings-position): when the alignment part after the comma is not a known keyword, the number
// is still applied and only the alignment is ignored (the spec text would skip the whole setting).
// Regions are not supported: `region:` settings are dropped.

/** Layout values of a cue, with the defaults a WebVTT cue starts with. */
export interface CueLayout {
  vertical: '' | 'rl' | 'lr';
  line: number | 'auto';
  snapToLines: boolean;
  lineAlign: 'start' | 'center' | 'end';
  position: number | 'auto';
  positionAlign: 'auto' | 'line-left' | 'center' | 'line-right';
  size: number;
  align: 'start' | 'center' | 'end' | 'left' | 'right';
}

/** A setting token that was not kept, and why. */
export interface IgnoredSetting {
  token: string;
  reason: string;
}

const DEFAULT_LAYOUT: CueLayout = {
  vertical: '',
  line: 'auto',
  snapToLines: true,
  lineAlign: 'start',
  position: 'auto',
  positionAlign: 'auto',
  size: 100,
  align: 'center',
};

const LINE_ALIGNS = ['start', 'center', 'end'] as const;
const POSITION_ALIGNS = ['line-left', 'center', 'line-right'] as const;
const TEXT_ALIGNS = ['start', 'center', 'end', 'left', 'right'] as const;

/** HTML "split a string on spaces": ASCII whitespace is tab, LF, FF, CR and space. */
const ASCII_WHITESPACE = /[\t\n\f\r ]+/;

function includes<T extends string>(list: readonly T[], value: string | null): value is T {
  return value !== null && (list as readonly string[]).includes(value);
}

/**
 * HTML "rules for parsing floating-point number values" for text already restricted to an
 * optional leading "-", digits and at most one "." between digits. Those rules exclude -0 and
 * turn values that round past the largest double into an error, which parseFloat mirrors.
 */
function parseDecimal(text: string): number | null {
  const value = Number.parseFloat(text);
  if (!Number.isFinite(value)) return null;
  return value === 0 ? 0 : value;
}

/** WebVTT "parse a percentage string": digits, optional "." and digits, then "%"; 0..100. */
function parsePercentage(text: string): number | null {
  if (!/^\d+(\.\d+)?%$/.test(text)) return null;
  const value = parseDecimal(text.slice(0, -1));
  if (value === null || value < 0 || value > 100) return null;
  return value;
}

function parseLinePosition(linepos: string): { value: number; snap: boolean } | null {
  if (!/\d/.test(linepos)) return null;
  if (linepos.endsWith('%')) {
    const value = parsePercentage(linepos);
    return value === null ? null : { value, snap: false };
  }
  if (!/^-?\d+(\.\d+)?$/.test(linepos)) return null;
  const value = parseDecimal(linepos);
  return value === null ? null : { value, snap: true };
}

function splitOnComma(value: string): [string, string | null] {
  const comma = value.indexOf(',');
  return comma === -1 ? [value, null] : [value.slice(0, comma), value.slice(comma + 1)];
}

interface Interpretation {
  layout: CueLayout;
  tokens: { index: number; token: string }[];
  ignored: IgnoredSetting[];
}

function interpret(settings: string): Interpretation {
  const layout: CueLayout = { ...DEFAULT_LAYOUT };
  const ignored: IgnoredSetting[] = [];
  // For each setting name: the last token that set it (as written) and its place in the list.
  const kept = new Map<string, { index: number; written: string; token: string }>();
  let lineText: string | null = null;
  let lineAlignText: string | null = null;
  let positionText: string | null = null;
  let positionAlignText: string | null = null;

  const remember = (name: string, index: number, token: string, written: string) => {
    const previous = kept.get(name);
    if (previous) {
      ignored.push({ token: previous.written, reason: `a later "${name}" setting replaces it` });
    }
    kept.set(name, { index, written, token });
  };

  const words = settings.split(ASCII_WHITESPACE).filter((w) => w !== '');
  words.forEach((setting, index) => {
    const colon = setting.indexOf(':');
    if (colon <= 0 || colon === setting.length - 1) {
      ignored.push({ token: setting, reason: 'it is not written as name:value' });
      return;
    }
    const name = setting.slice(0, colon);
    const value = setting.slice(colon + 1);
    switch (name) {
      case 'region':
        ignored.push({ token: setting, reason: 'regions are not supported' });
        return;
      case 'vertical':
        if (value !== 'rl' && value !== 'lr') break;
        layout.vertical = value;
        remember('vertical', index, `vertical:${value}`, setting);
        return;
      case 'line': {
        const [linepos, linealign] = splitOnComma(value);
        const parsed = parseLinePosition(linepos);
        if (parsed === null) break;
        if (includes(LINE_ALIGNS, linealign)) {
          layout.lineAlign = linealign;
          lineAlignText = linealign;
        } else if (linealign !== null) {
          ignored.push({ token: setting, reason: `line alignment "${linealign}" is not valid and was ignored` });
        }
        layout.line = parsed.value;
        layout.snapToLines = parsed.snap;
        lineText = linepos;
        remember('line', index, '', setting);
        return;
      }
      case 'position': {
        const [colpos, colalign] = splitOnComma(value);
        const parsed = parsePercentage(colpos);
        if (parsed === null) break;
        if (includes(POSITION_ALIGNS, colalign)) {
          layout.positionAlign = colalign;
          positionAlignText = colalign;
        } else if (colalign !== null) {
          ignored.push({ token: setting, reason: `position alignment "${colalign}" is not valid and was ignored` });
        }
        layout.position = parsed;
        positionText = colpos;
        remember('position', index, '', setting);
        return;
      }
      case 'size': {
        const parsed = parsePercentage(value);
        if (parsed === null) break;
        layout.size = parsed;
        remember('size', index, `size:${value}`, setting);
        return;
      }
      case 'align':
        if (!includes(TEXT_ALIGNS, value)) break;
        layout.align = value;
        remember('align', index, `align:${value}`, setting);
        return;
      default:
        ignored.push({ token: setting, reason: `"${name}" is not a WebVTT cue setting` });
        return;
    }
    ignored.push({ token: setting, reason: 'its value is not valid' });
  });

  // Line and position are written back from the final values: an alignment set by an earlier
  // token still applies when a later token only changes the number.
  const tokens = [...kept.entries()].map(([name, entry]) => {
    if (name === 'line') {
      return { index: entry.index, token: `line:${lineText}${lineAlignText ? `,${lineAlignText}` : ''}` };
    }
    if (name === 'position') {
      const align = positionAlignText ? `,${positionAlignText}` : '';
      return { index: entry.index, token: `position:${positionText}${align}` };
    }
    return { index: entry.index, token: entry.token };
  });
  tokens.sort((a, b) => a.index - b.index);
  return { layout, tokens, ignored };
}

/**
 * Reads a settings list into layout values, so the player, the editor and the tests agree on
 * what a cue's settings mean (invalid settings are ignored one by one, as the spec requires).
 */
export function readCueSettings(settings: string | undefined | null): CueLayout {
  return interpret(settings ?? '').layout;
}

/**
 * Keeps only the settings that take effect, in their written order and spelling, and lists the
 * rest, so imported files can be stored clean and the author told what was dropped.
 */
export function cleanCueSettings(settings: string | undefined | null): {
  settings: string;
  ignored: IgnoredSetting[];
} {
  const { tokens, ignored } = interpret(settings ?? '');
  return { settings: tokens.map((t) => t.token).join(' '), ignored };
}
