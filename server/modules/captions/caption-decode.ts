// Turning an uploaded caption file's bytes into text before parsing (server only: chardet and
// iconv-lite are Node packages, so this cannot live in shared/).
//
// WebVTT must be UTF-8 (W3C WebVTT: "WebVTT files are UTF-8"); SRT files in the wild are often in
// a legacy single-byte code page. We accept UTF-8 (with or without BOM) and UTF-16 with a BOM,
// convert text that chardet recognises as a Windows or ISO-8859 code page (with a warning naming
// it), and refuse anything else, including binary files.
import chardet from 'chardet';
import iconv from 'iconv-lite';

/** A note about the decoding step, shown to the author beside the parse problems. */
export interface DecodeProblem {
  severity: 'error' | 'warning';
  message: string;
}

/** Decoded text (empty when refused), the encoding it was read as (null when refused) and notes. */
export interface DecodedCaptionText {
  text: string;
  encoding: string | null;
  problems: DecodeProblem[];
}

const UTF8_BOM = [0xef, 0xbb, 0xbf];

function startsWith(buf: Buffer, bytes: readonly number[]): boolean {
  return bytes.every((b, i) => buf[i] === b);
}

function refuse(message: string): DecodedCaptionText {
  return { text: '', encoding: null, problems: [{ severity: 'error', message }] };
}

// Control characters other than tab, LF, FF and CR do not belong in caption text.
const BINARY_CONTROL = /[\u0000-\u0008\u000b\u000e-\u001f]/;

function checkText(text: string, encoding: string, problems: DecodeProblem[]): DecodedCaptionText {
  if (text.includes('\u0000')) {
    return refuse('The file contains NUL characters, so it looks like a binary file rather than captions.');
  }
  if (BINARY_CONTROL.test(text)) {
    return refuse('The file contains control characters that do not belong in caption text; it looks like a binary file.');
  }
  return { text, encoding, problems };
}

// chardet names for code pages iconv-lite can convert and that we accept.
const LEGACY_SINGLE_BYTE = /^(windows-125[0-8]|ISO-8859-\d{1,2}|KOI8-R)$/;

/**
 * Reads uploaded caption bytes as text. UTF-8 (BOM optional) is taken as is; UTF-16 LE/BE with a
 * BOM is converted; other bytes are identified with chardet and converted with iconv-lite when
 * they are a Windows or ISO-8859 code page. ISO-8859-1 is read as windows-1252, its superset, as
 * the WHATWG Encoding Standard does for that label (from memory). Empty, binary or unrecognised
 * files are refused with a message saying why; nothing here throws on bad input.
 */
export function decodeCaptionBytes(buf: Buffer): DecodedCaptionText {
  if (buf.length === 0) return refuse('The file is empty.');

  if (startsWith(buf, [0xff, 0xfe])) {
    if (startsWith(buf, [0xff, 0xfe, 0x00, 0x00])) {
      return refuse('The file is UTF-32, which is not supported. Save it as UTF-8 and try again.');
    }
    return checkText(iconv.decode(buf, 'utf16-le'), 'UTF-16LE', [
      { severity: 'warning', message: 'The file was UTF-16 (little-endian) and has been converted to UTF-8.' },
    ]);
  }
  if (startsWith(buf, [0xfe, 0xff])) {
    return checkText(iconv.decode(buf, 'utf16-be'), 'UTF-16BE', [
      { severity: 'warning', message: 'The file was UTF-16 (big-endian) and has been converted to UTF-8.' },
    ]);
  }

  const hasBom = startsWith(buf, UTF8_BOM);
  const body = hasBom ? buf.subarray(3) : buf;
  if (body.includes(0)) {
    return refuse('The file contains NUL bytes, so it looks like a binary file rather than captions.');
  }
  // In UTF-8 and in every accepted code page these bytes can only be control characters.
  if (body.some((b) => b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0c && b !== 0x0d)) {
    return refuse('The file contains control characters that do not belong in caption text; it looks like a binary file.');
  }
  try {
    const text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(body);
    return checkText(text, 'UTF-8', []);
  } catch {
    // Not valid UTF-8: try to identify a legacy code page below.
  }
  if (hasBom) {
    return refuse('The file starts with a UTF-8 byte order mark but is not valid UTF-8.');
  }

  const best = chardet.analyse(body)[0];
  if (!best || best.confidence < 10) {
    return refuse('The text encoding of the file could not be recognised. Save it as UTF-8 and try again.');
  }
  const encoding = best.name === 'ISO-8859-1' ? 'windows-1252' : best.name;
  if (!LEGACY_SINGLE_BYTE.test(best.name) || !iconv.encodingExists(encoding)) {
    return refuse(`The file looks like ${best.name}, which is not accepted here. Save it as UTF-8 and try again.`);
  }
  const detected = best.name === encoding ? encoding : `${encoding} (detected as ${best.name})`;
  return checkText(iconv.decode(body, encoding), encoding, [
    {
      severity: 'warning',
      message: `The file was not UTF-8; it was read as ${detected} and converted. Check accented letters in the captions.`,
    },
  ]);
}
