import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildBenchCues, buildBenchRecords, buildEvalLines } from '../../fixtures/names-eval/generate';
import { EVAL_RECORDS } from '../../fixtures/names-eval/records';

// Consistency checks on the INVENTED names evaluation data (no matcher involved): labels must
// come from where the generator placed each hand-written form.
const committed = JSON.parse(readFileSync(new URL('../../fixtures/names-eval/eval-set.json', import.meta.url), 'utf8')) as {
  note: string;
  lines: ReturnType<typeof buildEvalLines>;
};

describe('names evaluation set (tests/fixtures/names-eval)', () => {
  const lines = buildEvalLines();

  it('the committed eval-set.json is what the seeded generator builds', () => {
    expect(committed.lines).toEqual(lines);
    expect(committed.note).toMatch(/INVENTED/);
  });

  it('has at least 200 labelled lines, some with no name and some with two', () => {
    const labelled = lines.filter((l) => l.expected.length > 0);
    expect(labelled.length).toBeGreaterThanOrEqual(200);
    expect(lines.filter((l) => l.expected.length === 0).length).toBeGreaterThanOrEqual(50);
    expect(lines.filter((l) => l.expected.length === 2).length).toBeGreaterThan(0);
  });

  it('every label span covers a caption form written for that record', () => {
    const forms = new Map(EVAL_RECORDS.map((r) => [r.id, new Set(r.heard.map((h) => h.text))]));
    for (const line of lines) {
      for (const e of line.expected) {
        expect(forms.get(e.recordId)?.has(line.text.slice(e.start, e.end))).toBe(true);
      }
    }
  });

  it('covers every kind of caption form', () => {
    const kinds = new Set(lines.flatMap((l) => l.expected.map((e) => e.how)));
    for (const how of ['exact', 'dropped-hyphen', 'joined', 'split', 'vowel-swap', 'consonant-slip', 'sound-alike', 'recorded-variant']) {
      expect(kinds.has(how as never)).toBe(true);
    }
  });

  it('benchmark data is deterministic: 2,000 records with unique ids and 10,000 cues', () => {
    const records = buildBenchRecords(2000);
    expect(records).toHaveLength(2000);
    expect(new Set(records.map((r) => r.id)).size).toBe(2000);
    expect(buildBenchRecords(2000)).toEqual(records);
    const cues = buildBenchCues(records, 10_000);
    expect(cues).toHaveLength(10_000);
    expect(cues.slice(0, 20)).toEqual(buildBenchCues(records, 20));
  });
});
