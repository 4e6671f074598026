import { open } from 'node:fs/promises';

/**
 * One top-level box of an ISO base media file (MP4, MOV, M4A). Layout per ISO/IEC 14496-12
 * §4.2 "Object structure": a 32-bit big-endian size, a four-character type; size 1 means a 64-bit
 * "largesize" follows the type; size 0 means the box runs to the end of the file.
 */
export interface Mp4Box {
  type: string;
  /** Byte offset of the box header in the file. */
  offset: number;
  /** Whole box length in bytes, header included (resolved for size 0 and largesize boxes). */
  size: number;
  /** 8 for a plain header, 16 with a 64-bit largesize. */
  headerSize: number;
  /** The box declared size 0 ("extends to end of file"). */
  toEndOfFile: boolean;
  /** The declared size runs past the end of the file: the file was cut short. */
  truncated: boolean;
}

/** Raised when the bytes cannot be a box structure at all (size 2..7, or a largesize beyond 2^53). */
export class Mp4BoxError extends Error {}

/** Random access to the bytes being walked, so files and in-memory buffers share one parser. */
interface ByteSource {
  length: number;
  read(offset: number, length: number): Promise<Uint8Array>;
}

async function walk(src: ByteSource, maxBoxes: number): Promise<Mp4Box[]> {
  const boxes: Mp4Box[] = [];
  let offset = 0;
  while (offset + 8 <= src.length && boxes.length < maxBoxes) {
    const head = await src.read(offset, 16);
    const view = new DataView(head.buffer, head.byteOffset, head.byteLength);
    const size32 = view.getUint32(0);
    const type = String.fromCharCode(head[4], head[5], head[6], head[7]);
    let size: number;
    let headerSize = 8;
    let toEndOfFile = false;
    if (size32 === 1) {
      if (head.byteLength < 16) {
        boxes.push({ type, offset, size: src.length - offset, headerSize: 16, toEndOfFile, truncated: true });
        break;
      }
      const large = view.getBigUint64(8);
      if (large > BigInt(Number.MAX_SAFE_INTEGER)) throw new Mp4BoxError(`box '${type}' at ${offset} is too large`);
      size = Number(large);
      headerSize = 16;
      if (size < 16) throw new Mp4BoxError(`box '${type}' at ${offset} has largesize ${size} < 16`);
    } else if (size32 === 0) {
      size = src.length - offset;
      toEndOfFile = true;
    } else if (size32 < 8) {
      throw new Mp4BoxError(`box '${type}' at ${offset} has impossible size ${size32}`);
    } else {
      size = size32;
    }
    const truncated = offset + size > src.length;
    boxes.push({ type, offset, size, headerSize, toEndOfFile, truncated });
    if (truncated || toEndOfFile) break;
    offset += size;
  }
  return boxes;
}

/**
 * Lists the top-level boxes of an MP4/MOV file without reading their payloads, which is how we
 * prove that `moov` precedes `mdat` (ffprobe does not say where moov sits) and spot files whose
 * last box was cut off by an interrupted upload.
 */
export async function readTopLevelBoxes(path: string, maxBoxes = 10_000): Promise<Mp4Box[]> {
  const fh = await open(path, 'r');
  try {
    const { size } = await fh.stat();
    return await walk(
      {
        length: size,
        read: async (offset, length) => {
          const buf = Buffer.alloc(Math.min(length, size - offset));
          const { bytesRead } = await fh.read(buf, 0, buf.length, offset);
          return buf.subarray(0, bytesRead);
        },
      },
      maxBoxes,
    );
  } finally {
    await fh.close();
  }
}

/** The same walk over bytes already in memory (tests, or a buffered upload head). */
export function readTopLevelBoxesFromBytes(bytes: Uint8Array, maxBoxes = 10_000): Promise<Mp4Box[]> {
  return walk(
    { length: bytes.byteLength, read: async (offset, length) => bytes.subarray(offset, offset + length) },
    maxBoxes,
  );
}

/**
 * True when the movie header comes before the media data, so a browser can start playing after the
 * first bytes instead of fetching the end of the file first (the point of `-movflags +faststart`).
 */
export function isFaststart(boxes: readonly Mp4Box[]): boolean {
  const moov = boxes.findIndex((b) => b.type === 'moov');
  const mdat = boxes.findIndex((b) => b.type === 'mdat');
  return moov !== -1 && (mdat === -1 || moov < mdat);
}
