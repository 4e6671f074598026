// Cue text helpers: what a cue shows once tags and escapes are resolved, and the reverse escape.
import type { TreeNode, TreeNodeObjectTagNameWithRt } from 'webvtt-parser';

/** A node of parsed cue text; ruby text (`rt`) can appear below `ruby`. */
export type CueTextNode = TreeNode<TreeNodeObjectTagNameWithRt>;
import { WebVTTCueTextParser, vttEntities } from './vtt-engine';

/**
 * Parses WebVTT cue text into the spec's node tree (text, timestamps, b/i/u/c/v/lang/ruby/rt),
 * for callers that convert cue text to other formats.
 */
export function parseCueText(text: string): CueTextNode[] {
  const parser = new WebVTTCueTextParser(text, () => {}, 'subtitles', vttEntities);
  return parser.parse(0, Number.MAX_VALUE).children;
}

function collectText(nodes: readonly CueTextNode[], out: string[]): void {
  for (const node of nodes) {
    if (node.type === 'text') out.push(node.value);
    else if (node.type === 'object' && node.name !== 'rt') collectText(node.children, out);
  }
}

/**
 * The characters a viewer reads: tags removed, escapes decoded, ruby text left out (as in the
 * spec's rules for extracting a chapter title). Reading-speed and line-length checks count these.
 */
export function cuePlainText(text: string): string {
  const out: string[] = [];
  collectText(parseCueText(text), out);
  return out.join('');
}

/** Turns plain text into cue text that shows exactly that text ("&", "<" and ">" escaped). */
export function escapeCueText(plain: string): string {
  return plain.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}
