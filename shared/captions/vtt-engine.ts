// The one place that loads webvtt-parser (a CommonJS package, hence the default import) together
// with its full HTML entity table: without the table, escapes such as "&amp;" decode wrongly.
import webvtt from 'webvtt-parser';
import type { Entity } from 'webvtt-parser';
import htmlEntities from 'webvtt-parser/html-entities.json';

/** Named character references for cue text, passed to every parser instance. */
export const vttEntities = htmlEntities as Record<Entity, string>;

/** webvtt-parser's classes, re-exported so callers never touch the CommonJS default object. */
export const { WebVTTParser, WebVTTCueTimingsAndSettingsParser, WebVTTCueTextParser } = webvtt;
