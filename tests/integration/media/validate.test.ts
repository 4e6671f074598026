import { open, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileTypeFromFile } from 'file-type';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inspectUpload, probeMedia, ProbeFailure, sniffHead, type HeadKind } from '../../../server/media/probe';
import { generateBadFiles, generateClip, type BadFileKind } from '../../support/make-clip';

let dir: string;
let bad: Record<BadFileKind, string>;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-validate-'));
  bad = await generateBadFiles(path.join(dir, 'bad'));
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function refusal(file: string, limits = {}) {
  const r = await inspectUpload(file, limits);
  if (r.ok) throw new Error(`${file} was accepted`);
  return r.error;
}

describe('validateUpload refuses every broken upload with its own message', () => {
  const cases: [BadFileKind, string, RegExp][] = [
    ['text', 'not_media', /^This is a text file, not a video\./],
    ['empty', 'empty_file', /^The file is empty \(0 bytes\)/],
    ['truncated', 'truncated', /damaged or incomplete/],
    ['truncatedFaststart', 'truncated', /incomplete: it stops before the end/],
    ['truncatedMkv', 'truncated', /incomplete: it stops before the end/],
    ['audioOnly', 'audio_only', /^This file has sound but no picture/],
    ['stillPng', 'still_image', /^This is a still picture, not a video/],
    ['randomBytes', 'unknown_format', /^We could not recognise this file as a video/],
  ];
  it.each(cases)('%s → %s', async (kind, code, message) => {
    const err = await refusal(bad[kind]);
    expect(err.code).toBe(code);
    expect(err.message).toMatch(message);
  });

  it('a faststart MP4 cut to 40 % still probes with its full duration; the box walk is what catches it', async () => {
    const probe = await probeMedia(bad.truncatedFaststart);
    expect(probe.durationSec).toBeCloseTo(3, 1);
    expect(probe.tail).toMatchObject({ ok: false, method: 'mp4-boxes' });
    expect(probe.tail?.detail).toMatch(/'mdat' box declares/);
  });

  it('a Matroska file cut to 40 % is caught by reading the packets of the last second', async () => {
    const probe = await probeMedia(bad.truncatedMkv);
    expect(probe.tail).toMatchObject({ ok: false, method: 'last-second-packets' });
  });

  it('an MP4 cut before its moov box cannot be probed at all; the ftyp at the start says it was a video', async () => {
    await expect(probeMedia(bad.truncated)).rejects.toMatchObject({ head: 'iso-bmff' });
    await expect(probeMedia(bad.truncated)).rejects.toBeInstanceOf(ProbeFailure);
  });

  it('a clip of the right length, size and format passes', async () => {
    const good = await generateClip(path.join(dir, 'good.mp4'), { seconds: 2, width: 320, height: 180, audio: true });
    const r = await inspectUpload(good);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.probe.tail).toMatchObject({ ok: true });
  });

  it('too short: 0.5 s', async () => {
    const clip = await generateClip(path.join(dir, 'short.mp4'), { seconds: 0.5, width: 320, height: 180, audio: false });
    const err = await refusal(clip);
    expect(err.code).toBe('too_short');
    expect(err.message).toBe('The video lasts 0.5 s; a tour must be at least 1 s long.');
  });

  it('absurd dimensions: 48 × 48 pixels', async () => {
    const clip = await generateClip(path.join(dir, 'tiny.mp4'), { seconds: 2, width: 48, height: 48, audio: false });
    const err = await refusal(clip);
    expect(err.code).toBe('bad_dimensions');
    expect(err.message).toContain('48 × 48 pixels');
  });

  it('too long against a configured limit', async () => {
    const clip = await generateClip(path.join(dir, 'long.mp4'), { seconds: 2, width: 320, height: 180, audio: false });
    const err = await refusal(clip, { maxDurationSec: 1.5 });
    expect(err.code).toBe('too_long');
    expect(err.message).toMatch(/^The video lasts 2 s; the longest tour we accept is 1\.5 s\./);
  });
});

describe('sniffHead agrees with the file-type reference library (npm) on generated files', () => {
  const expected: Record<string, HeadKind> = { mp4: 'iso-bmff', m4a: 'iso-bmff', mov: 'iso-bmff', mkv: 'ebml', webm: 'ebml', avi: 'riff', png: 'image' };

  it('mp4, mov, mkv, webm, avi, m4a, png', async () => {
    const files = [
      await generateClip(path.join(dir, 's.mp4'), { seconds: 1, width: 160, height: 90, audio: false }),
      await generateClip(path.join(dir, 's.mov'), { seconds: 1, width: 160, height: 90, audio: false }),
      await generateClip(path.join(dir, 's.mkv'), { seconds: 1, width: 160, height: 90, audio: false }),
      await generateClip(path.join(dir, 's.webm'), { seconds: 1, width: 160, height: 90, audio: false, codec: 'libvpx-vp9' }),
      await generateClip(path.join(dir, 's.avi'), { seconds: 1, width: 160, height: 90, audio: false, codec: 'mpeg4' }),
      bad.audioOnly,
      bad.stillPng,
    ];
    for (const f of files) {
      const ref = await fileTypeFromFile(f);
      expect(ref, f).toBeDefined();
      const fh = await open(f, 'r');
      const head = Buffer.alloc(4096);
      const { bytesRead } = await fh.read(head, 0, 4096, 0);
      await fh.close();
      expect(sniffHead(head.subarray(0, bytesRead)), `${f} (${ref!.ext})`).toBe(expected[ref!.ext]);
    }
  });

  it('neither recognises the random bytes; file-type finds no type in the text file, which we call text', async () => {
    expect(await fileTypeFromFile(bad.randomBytes)).toBeUndefined();
    expect(await fileTypeFromFile(bad.text)).toBeUndefined();
  });
});
