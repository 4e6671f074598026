import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isFaststart, readTopLevelBoxes, type Mp4Box } from '../../../server/media/mp4-boxes';
import { ffprobeRaw, traceTopLevelAtoms } from '../../support/ffprobe-check';
import { generateClip } from '../../support/make-clip';

let dir: string;
let fast: string;
let plain: string;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-boxes-'));
  fast = await generateClip(path.join(dir, 'fast.mp4'), { seconds: 2, width: 320, height: 180, audio: true });
  plain = await generateClip(path.join(dir, 'plain.mp4'), { seconds: 2, width: 320, height: 180, audio: true, faststart: false });
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** Our boxes in the shape ffmpeg's trace prints them (see traceTopLevelAtoms). */
function asTrace(boxes: Mp4Box[]) {
  return boxes.map((b) => ({ type: b.type, sz: b.size - (b.headerSize - 8), afterHeader: b.offset + b.headerSize }));
}

describe('readTopLevelBoxes on files written by ffmpeg (ffmpeg-formats, mov muxer: -movflags +faststart moves moov before mdat)', () => {
  it('a faststart file: ftyp, moov, …, mdat — and the walk agrees with ffmpeg\'s own demuxer trace', async () => {
    const boxes = await readTopLevelBoxes(fast);
    expect(boxes[0].type).toBe('ftyp');
    expect(boxes.map((b) => b.type)).toEqual(['ftyp', 'moov', 'free', 'mdat']);
    expect(isFaststart(boxes)).toBe(true);
    expect(asTrace(boxes)).toEqual(await traceTopLevelAtoms(fast));
  });

  it('a file without faststart has moov after mdat', async () => {
    const boxes = await readTopLevelBoxes(plain);
    expect(boxes.map((b) => b.type)).toEqual(['ftyp', 'free', 'mdat', 'moov']);
    expect(isFaststart(boxes)).toBe(false);
    expect(asTrace(boxes)).toEqual(await traceTopLevelAtoms(plain));
  });

  it('boxes tile the whole file with no gap', async () => {
    const boxes = await readTopLevelBoxes(plain);
    const bytes = await readFile(plain);
    let at = 0;
    for (const b of boxes) {
      expect(b.offset).toBe(at);
      at += b.size;
    }
    expect(at).toBe(bytes.length);
  });

  it('a 64-bit largesize mdat header (ISO/IEC 14496-12 §4.2) reads the same as ffmpeg reads it', async () => {
    // ffmpeg reserves an 8-byte "free" box before mdat precisely so the header can grow to 16 bytes;
    // turning free+mdat into one largesize mdat keeps every offset in the file valid.
    const bytes = Buffer.from(await readFile(plain));
    const before = await readTopLevelBoxes(plain);
    const free = before.find((b) => b.type === 'free')!;
    const mdat = before.find((b) => b.type === 'mdat')!;
    expect(mdat.offset).toBe(free.offset + 8);
    bytes.writeUInt32BE(1, free.offset);
    bytes.write('mdat', free.offset + 4, 'latin1');
    bytes.writeBigUInt64BE(BigInt(mdat.size + 8), free.offset + 8);
    const large = path.join(dir, 'large.mp4');
    await writeFile(large, bytes);

    const boxes = await readTopLevelBoxes(large);
    expect(boxes.map((b) => [b.type, b.headerSize])).toEqual([['ftyp', 8], ['mdat', 16], ['moov', 8]]);
    expect(asTrace(boxes)).toEqual(await traceTopLevelAtoms(large));
    const { stdout } = await ffprobeRaw(['-v', 'error', '-show_entries', 'format=duration', '-of', 'csv=p=0', large]);
    expect(Number(stdout)).toBeCloseTo(2, 1);
  });
});
