import { describe, expect, it } from 'vitest';
import {
  describeDuration,
  isWebReady,
  parseProbeJson,
  ProbeFailure,
  sniffHead,
  validateUpload,
  webReadyIssues,
  type MediaProbe,
} from '../../../server/media/probe';

const bytes = (...xs: number[]) => Uint8Array.from(xs);

describe('sniffHead — file signatures', () => {
  it('PNG: 89 50 4E 47 0D 0A 1A 0A (W3C PNG specification, §5.2 PNG signature)', () => {
    expect(sniffHead(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13))).toBe('image');
  });

  it('Matroska/WebM: EBML header element ID 0x1A45DFA3 (RFC 8794, EBML)', () => {
    expect(sniffHead(bytes(0x1a, 0x45, 0xdf, 0xa3, 0x9f, 0x42, 0x86, 0x81))).toBe('ebml');
  });

  it('MPEG-TS: sync byte 0x47 at the start of every 188-byte packet (ISO/IEC 13818-1)', () => {
    const ts = new Uint8Array(376);
    ts[0] = 0x47;
    ts[188] = 0x47;
    expect(sniffHead(ts)).toBe('mpeg-ts');
  });

  it('ISO base media: a box type such as ftyp in bytes 4–7 (ISO/IEC 14496-12 §4.2)', () => {
    const head = Buffer.alloc(32);
    head.writeUInt32BE(32, 0);
    head.write('ftypisom', 4, 'latin1');
    expect(sniffHead(head)).toBe('iso-bmff');
  });

  it('UTF-8 text, accents included, is text; NUL or other control bytes are not', () => {
    expect(sniffHead(Buffer.from('Tour notes — the maple by the gate, café corner\r\n\tend'))).toBe('text');
    expect(sniffHead(Buffer.from('almost text\u0000'))).toBe('unknown');
    expect(sniffHead(bytes(0xa5, 0xff, 0x10, 0x80))).toBe('unknown');
    expect(sniffHead(new Uint8Array(0))).toBe('empty');
  });

  it('a multi-byte character cut at the 4096-byte sample edge does not make text look binary', () => {
    const text = Buffer.from('é'.repeat(3000)); // 6000 bytes, two per character
    const sample = text.subarray(0, 4095); // ends halfway through a character...
    const padded = Buffer.concat([Buffer.from('a'), sample]); // ...at exactly 4096 bytes
    expect(padded.length).toBe(4096);
    expect(sniffHead(padded)).toBe('text');
  });
});

// Recorded shape of `ffprobe -print_format json -show_format -show_streams` (ffprobe 5.1), with
// values edited to the cases under test.
const phoneJson = JSON.stringify({
  streams: [
    { index: 0, codec_type: 'video', codec_name: 'mjpeg', width: 300, height: 300, disposition: { attached_pic: 1 } },
    {
      index: 1, codec_type: 'video', codec_name: 'h264', profile: 'High', level: 40, pix_fmt: 'yuv420p',
      width: 1920, height: 1080, sample_aspect_ratio: '1:1', avg_frame_rate: '30000/1001', r_frame_rate: '30000/1001',
      nb_frames: '300', bit_rate: '17000000', duration: '10.010000',
      side_data_list: [{ side_data_type: 'Display Matrix', displaymatrix: '...', rotation: -90 }],
    },
    { index: 2, codec_type: 'audio', codec_name: 'aac', profile: 'LC', channels: 2, sample_rate: '48000', bit_rate: '192000' },
  ],
  format: { format_name: 'mov,mp4,m4a,3gp,3g2,mj2', duration: '10.010000', start_time: '0.000000', bit_rate: '17300000', tags: { major_brand: 'qt  ' } },
});

describe('parseProbeJson', () => {
  it('skips attached cover art, applies the display rotation, reads fps as a ratio', () => {
    const p = parseProbeJson(phoneJson, '/x.mov', 100, 'iso-bmff');
    expect(p.video).toMatchObject({ index: 1, codec: 'h264', width: 1920, height: 1080, displayWidth: 1080, displayHeight: 1920, rotation: 90 });
    expect(p.video?.fps).toBeCloseTo(29.97, 2);
    expect(p.audio).toMatchObject({ index: 2, codec: 'aac', profile: 'LC', channels: 2, sampleRate: 48000, bitRateKbps: 192 });
    expect(p).toMatchObject({ durationSec: 10.01, majorBrand: 'qt  ', streamCount: 3 });
  });

  it('applies a non-square sample aspect ratio (720×576 at SAR 16:15 shows as 768×576) and reads field order', () => {
    const json = JSON.stringify({
      streams: [{ index: 0, codec_type: 'video', codec_name: 'mpeg2video', width: 720, height: 576, sample_aspect_ratio: '16:15', avg_frame_rate: '25/1', field_order: 'tt' }],
      format: { format_name: 'mpeg', duration: '4.0' },
    });
    expect(parseProbeJson(json, '/x.mpg', 1, 'mpeg-ps').video).toMatchObject({ displayWidth: 768, displayHeight: 576, fps: 25, interlaced: true });
    expect(parseProbeJson(phoneJson, '/x.mov', 1, 'iso-bmff').video?.interlaced).toBe(false);
  });
});

function probe(over: Partial<MediaProbe> = {}, video: Partial<NonNullable<MediaProbe['video']>> = {}): MediaProbe {
  return {
    path: '/x.mp4', fileSize: 1000, head: 'iso-bmff', container: 'mov,mp4,m4a,3gp,3g2,mj2', startSec: 0, durationSec: 30, streamCount: 2,
    video: { index: 0, codec: 'h264', profile: 'High', pixFmt: 'yuv420p', width: 1280, height: 720, displayWidth: 1280, displayHeight: 720, rotation: 0, fps: 30, interlaced: false, frameCount: 900, ...video },
    audio: { index: 1, codec: 'aac', profile: 'LC', channels: 2, sampleRate: 48000 },
    tail: { ok: true, method: 'last-second-packets', detail: '' },
    ...over,
  };
}

const code = (r: ReturnType<typeof validateUpload>) => (r.ok ? 'ok' : r.error.code);

describe('validateUpload (limits are our product rules: 1 s to 3 h, 64 to 8192 px a side)', () => {
  it('accepts an ordinary clip', () => {
    expect(code(validateUpload(probe(), 1000))).toBe('ok');
  });

  it('duration bounds are inclusive at 1 s and 3 h', () => {
    expect(code(validateUpload(probe({ durationSec: 0.99 }), 1000))).toBe('too_short');
    expect(code(validateUpload(probe({ durationSec: 1 }), 1000))).toBe('ok');
    expect(code(validateUpload(probe({ durationSec: 10800 }), 1000))).toBe('ok');
    const long = validateUpload(probe({ durationSec: 10801 }), 1000);
    expect(code(long)).toBe('too_long');
    expect(long.ok ? '' : long.error.message).toContain('3 h 00 min');
  });

  it('the longest duration is configurable', () => {
    expect(code(validateUpload(probe({ durationSec: 600 }), 1000, { maxDurationSec: 300 }))).toBe('too_long');
  });

  it('dimension bounds: 64 and 8192 pass, 63 and 8193 do not', () => {
    expect(code(validateUpload(probe({}, { displayWidth: 64, displayHeight: 64 }), 1000))).toBe('ok');
    expect(code(validateUpload(probe({}, { displayWidth: 8192, displayHeight: 4320 }), 1000))).toBe('ok');
    expect(code(validateUpload(probe({}, { displayWidth: 63, displayHeight: 64 }), 1000))).toBe('bad_dimensions');
    const wide = validateUpload(probe({}, { displayWidth: 8193, displayHeight: 100 }), 1000);
    expect(wide.ok ? '' : wide.error.message).toBe('The picture is 8193 × 100 pixels; tours need between 64 and 8192 pixels on each side.');
  });

  it('a single frame or an image demuxer is a still picture, checked before the container', () => {
    expect(code(validateUpload(probe({}, { frameCount: 1 }), 1000))).toBe('still_image');
    expect(code(validateUpload(probe({ container: 'png_pipe', durationSec: undefined }, { codec: 'png', frameCount: undefined }), 1000))).toBe('still_image');
    expect(code(validateUpload(probe({ container: 'image2' }), 1000))).toBe('still_image');
  });

  it('motion JPEG with many frames is video, not a still', () => {
    expect(code(validateUpload(probe({ container: 'avi' }, { codec: 'mjpeg', frameCount: undefined }), 1000))).toBe('ok');
  });

  it('sound without picture is refused as audio only', () => {
    expect(code(validateUpload(probe({ video: undefined }), 1000))).toBe('audio_only');
    expect(code(validateUpload(probe({ video: undefined, audio: undefined }), 1000))).toBe('no_streams');
  });

  it('containers outside the accepted list are refused by name', () => {
    const r = validateUpload(probe({ container: 'gif' }, { codec: 'gif', frameCount: 20 }), 1000);
    expect(code(r)).toBe('unsupported_container');
    expect(r.ok ? '' : r.error.message).toContain('(gif)');
  });

  it('a failed cut-short check or a missing duration means truncated', () => {
    expect(code(validateUpload(probe({ tail: { ok: false, method: 'mp4-boxes', detail: '' } }), 1000))).toBe('truncated');
    expect(code(validateUpload(probe({ durationSec: undefined }), 1000))).toBe('truncated');
  });

  it('probe failures are explained from the first bytes: empty, text, known container (damaged), unknown', () => {
    expect(code(validateUpload(new ProbeFailure('/a', 0, 'empty', ''), 0))).toBe('empty_file');
    expect(code(validateUpload(new ProbeFailure('/a', 10, 'text', ''), 10))).toBe('not_media');
    expect(code(validateUpload(new ProbeFailure('/a', 10, 'iso-bmff', 'moov atom not found'), 10))).toBe('truncated');
    expect(code(validateUpload(new ProbeFailure('/a', 10, 'ebml', ''), 10))).toBe('truncated');
    expect(code(validateUpload(new ProbeFailure('/a', 10, 'unknown', ''), 10))).toBe('unknown_format');
  });

  it('a text file that ffprobe happens to read (a caption file renamed .mp4) is still not media', () => {
    expect(code(validateUpload(probe({ head: 'text', container: 'srt', video: undefined, audio: undefined }), 50))).toBe('not_media');
  });
});

describe('isWebReady — ffmpeg documentation: H.264 yuv420p + AAC-LC in MP4 (domain.md)', () => {
  it('H.264 High yuv420p with AAC-LC in MP4 is web-ready; so is a silent clip', () => {
    expect(isWebReady(probe())).toBe(true);
    expect(isWebReady(probe({ audio: undefined }))).toBe(true);
  });

  it('negative case from domain.md: RGB through libx264 gives yuv444p, "High 4:4:4 Predictive" — not web-ready', () => {
    const p = probe({}, { profile: 'High 4:4:4 Predictive', pixFmt: 'yuv444p' });
    expect(isWebReady(p)).toBe(false);
    expect(webReadyIssues(p)).toEqual([
      'H.264 profile High 4:4:4 Predictive is not web-safe',
      'pixel format yuv444p is not yuv420p',
    ]);
  });

  it('HE-AAC, VP9, 10-bit and Matroska each break it', () => {
    expect(webReadyIssues(probe({ audio: { index: 1, codec: 'aac', profile: 'HE-AAC', channels: 2, sampleRate: 48000 } }))).toEqual(['AAC profile HE-AAC is not LC']);
    expect(isWebReady(probe({}, { codec: 'vp9', profile: 'Profile 0' }))).toBe(false);
    expect(isWebReady(probe({}, { profile: 'High 10', pixFmt: 'yuv420p10le' }))).toBe(false);
    expect(webReadyIssues(probe({ container: 'matroska,webm' }))).toEqual(['container matroska,webm is not MP4/MOV']);
  });
});

describe('describeDuration', () => {
  it('writes durations as an author reads them', () => {
    expect([describeDuration(0.44), describeDuration(75), describeDuration(7500)]).toEqual(['0.4 s', '1 min 15 s', '2 h 05 min']);
  });
});
