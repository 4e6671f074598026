import { describe, expect, it } from 'vitest';
import { isFaststart, Mp4BoxError, readTopLevelBoxesFromBytes } from '../../../server/media/mp4-boxes';

// Box layout per ISO/IEC 14496-12 §4.2 (object structure): unsigned int(32) size; unsigned int(32)
// type; if size == 1, unsigned int(64) largesize follows; size == 0 means "box extends to the end
// of the file". Sizes count the header.

function box(type: string, payloadBytes: number): Buffer {
  const b = Buffer.alloc(8 + payloadBytes, 0x11);
  b.writeUInt32BE(8 + payloadBytes, 0);
  b.write(type, 4, 'latin1');
  return b;
}

function largeBox(type: string, payloadBytes: number): Buffer {
  const b = Buffer.alloc(16 + payloadBytes, 0x22);
  b.writeUInt32BE(1, 0);
  b.write(type, 4, 'latin1');
  b.writeBigUInt64BE(BigInt(16 + payloadBytes), 8);
  return b;
}

describe('readTopLevelBoxes (ISO/IEC 14496-12 §4.2 box headers)', () => {
  it('walks plain 32-bit boxes and reports offset and size including the header', async () => {
    const file = Buffer.concat([box('ftyp', 24), box('moov', 100), box('free', 0), box('mdat', 50)]);
    const boxes = await readTopLevelBoxesFromBytes(file);
    expect(boxes.map((b) => [b.type, b.offset, b.size])).toEqual([
      ['ftyp', 0, 32],
      ['moov', 32, 108],
      ['free', 140, 8],
      ['mdat', 148, 58],
    ]);
    expect(boxes.every((b) => !b.truncated && b.headerSize === 8)).toBe(true);
    expect(isFaststart(boxes)).toBe(true);
  });

  it('reads a 64-bit largesize when size is 1', async () => {
    const file = Buffer.concat([box('ftyp', 16), largeBox('mdat', 40), box('moov', 10)]);
    const boxes = await readTopLevelBoxesFromBytes(file);
    expect(boxes.map((b) => [b.type, b.offset, b.size, b.headerSize])).toEqual([
      ['ftyp', 0, 24, 8],
      ['mdat', 24, 56, 16],
      ['moov', 80, 18, 8],
    ]);
    expect(isFaststart(boxes)).toBe(false);
  });

  it('treats size 0 as running to the end of the file', async () => {
    const mdat = box('mdat', 30);
    mdat.writeUInt32BE(0, 0);
    const file = Buffer.concat([box('ftyp', 16), box('moov', 8), mdat]);
    const boxes = await readTopLevelBoxesFromBytes(file);
    expect(boxes[2]).toMatchObject({ type: 'mdat', offset: 40, size: 38, toEndOfFile: true, truncated: false });
  });

  it('flags a box whose declared size runs past the end (a cut upload)', async () => {
    const full = Buffer.concat([box('ftyp', 16), box('moov', 20), box('mdat', 1000)]);
    const cut = full.subarray(0, 200);
    const boxes = await readTopLevelBoxesFromBytes(cut);
    expect(boxes.at(-1)).toMatchObject({ type: 'mdat', offset: 52, size: 1008, truncated: true });
  });

  it('rejects impossible sizes 2–7', async () => {
    const bad = box('ftyp', 8);
    bad.writeUInt32BE(5, 0);
    await expect(readTopLevelBoxesFromBytes(bad)).rejects.toThrow(Mp4BoxError);
  });

  it('isFaststart needs a moov, and it must come before mdat', () => {
    const mk = (types: string[]) => types.map((type, i) => ({ type, offset: i * 8, size: 8, headerSize: 8, toEndOfFile: false, truncated: false }));
    expect(isFaststart(mk(['ftyp', 'moov', 'mdat']))).toBe(true);
    expect(isFaststart(mk(['ftyp', 'free', 'mdat', 'moov']))).toBe(false);
    expect(isFaststart(mk(['ftyp', 'mdat']))).toBe(false);
  });
});
