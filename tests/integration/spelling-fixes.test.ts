// Spelling fixes through the HTTP API against a real MariaDB: flags, the moderators' queue, accept
// across tours with an audit, decline, undo, the later-edit and concurrency conflicts, and name
// detection. The club, its tours, the caption lines and every cultivar epithet are INVENTED for the
// fictional Fernhollow Garden Club. Word-boundary rules are Grovewalk's own (shared/names/replace.ts):
// a name is replaced only as whole words, never inside a longer word.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Cultivar } from '../../server/db/entities/cultivar.entity';
import { SpellingFix } from '../../server/db/entities/spelling-fix.entity';
import { SpellingFixChange } from '../../server/db/entities/spelling-fix-change.entity';
import type { Tour } from '../../server/db/entities/tour.entity';
import type { User } from '../../server/db/entities/user.entity';
import { acceptFixResponseSchema, proposeFixResponseSchema, spellingFixPage, undoFixResponseSchema } from '../../shared/schemas/spelling-fixes';
import { makeCultivarRow, makeTourRow } from '../support/caption-fixtures';
import { FLAG_LIMIT } from '../../server/modules/spelling-fixes/spelling-fix.router';
import { agentAs, waitForMail } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { addVariantRow, cueRows, cueTexts, makeTrackRow, trackVersion, variantTexts } from '../support/names-fixtures';

let server: TestServer;
let viewer: Agent;
let viewerUser: User;
let otherViewer: Agent;
let author: Agent;
let authorUser: User;
let moderator: Agent;
let moderator2: Agent;
let admin: Agent;
let anonymous: Agent;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: viewer, user: viewerUser } = await agentAs(server, 'viewer'));
  otherViewer = (await agentAs(server, 'viewer')).agent;
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  moderator = (await agentAs(server, 'moderator')).agent;
  moderator2 = (await agentAs(server, 'moderator')).agent;
  admin = (await agentAs(server, 'admin')).agent;
  anonymous = server.agent();
});
afterAll(async () => server.close());

const ds = () => server.dataSource;
const published = (title: string, patch: Partial<Tour> = {}) =>
  makeTourRow(ds(), authorUser.id, { title, state: 'published', publishedAt: new Date(), ...patch });
const draft = (title: string) => makeTourRow(ds(), authorUser.id, { title, state: 'ready' });
const record = (epithet: string, patch: Partial<Cultivar> = {}) => makeCultivarRow(ds(), epithet, [], patch);

describe('flagging a misspelling (any signed-in user)', () => {
  it('accepts a flag where the words occur in the cue, and returns the open fix for a repeated flag', async () => {
    const sora = await record('Sora-no-hane');
    const tour = await published('Fernhollow Garden Club: gate walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Welcome to the gate.', 'Here is Sora no hani by the gate.']);

    const r = await viewer.post('/api/spelling-fixes', { proposedText: 'Sora no hani', cultivarId: sora.id, cue: { trackId: track.id, startMs: 4000 } });
    expect(r.status).toBe(201);
    expect(() => proposeFixResponseSchema.parse(r.body)).not.toThrow();
    expect(r.body.created).toBe(true);
    expect(r.body.fix).toMatchObject({
      proposedText: 'Sora no hani',
      suggestion: { epithet: 'Sora-no-hane', acceptedName: "Acer palmatum 'Sora-no-hane'" },
      source: 'viewer',
      status: 'open',
      proposer: viewerUser.displayName,
      occurrences: 1,
      toursAffected: { count: 1, titles: ['Fernhollow Garden Club: gate walk (fictional)'] },
      changes: [],
    });

    // Same words in other letter case, by someone else: the same open fix comes back.
    const again = await otherViewer.post('/api/spelling-fixes', { proposedText: 'sora no HANI', cultivarId: sora.id });
    expect(again.status).toBe(200);
    expect(again.body.created).toBe(false);
    expect(again.body.fix.id).toBe(r.body.fix.id);
    expect(await ds().getRepository(SpellingFix).countBy({ cultivarId: sora.id })).toBe(1);
  });

  it('refuses text that is not in the cue, not in any visible caption, or only part of a word', async () => {
    const kumo = await record('Kumo-tsubasa');
    const tour = await published('Fernhollow Garden Club: pond walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Kumo tsubasr leans over the pond.', 'Nothing to see here.']);
    const secret = await draft('Fernhollow Garden Club: unpublished walk (fictional)');
    const hidden = await makeTrackRow(ds(), secret.id, ['Kumo tsubasq hides in a draft.']);

    const notInCue = await viewer.post('/api/spelling-fixes', { proposedText: 'Kumo tsubasr', cultivarId: kumo.id, cue: { trackId: track.id, startMs: 4000 } });
    expect(notInCue.status).toBe(400);
    expect(notInCue.body.error.code).toBe('text_not_in_cue');
    expect(notInCue.body.error.fields.proposedText).toBeTruthy();

    // "Kumo tsubas" is only the start of the word "tsubasr": not a whole-word occurrence.
    const partial = await viewer.post('/api/spelling-fixes', { proposedText: 'Kumo tsubas', cultivarId: kumo.id });
    expect(partial.status).toBe(400);
    expect(partial.body.error.code).toBe('text_not_found');

    // Only in a draft tour the viewer cannot see: not found for them, 404 for the cue itself.
    const inDraft = await viewer.post('/api/spelling-fixes', { proposedText: 'Kumo tsubasq', cultivarId: kumo.id });
    expect(inDraft.status).toBe(400);
    expect((await viewer.post('/api/spelling-fixes', { proposedText: 'Kumo tsubasq', cultivarId: kumo.id, cue: { trackId: hidden.id, startMs: 0 } })).status).toBe(404);
    // The tour's author can see the draft, so their flag is accepted.
    expect((await author.post('/api/spelling-fixes', { proposedText: 'Kumo tsubasq', cultivarId: kumo.id, cue: { trackId: hidden.id, startMs: 0 } })).status).toBe(201);

    expect(await ds().getRepository(SpellingFix).countBy({ cultivarId: kumo.id, source: 'viewer' })).toBe(1);
  });

  it('refuses the accepted name itself, another record\'s name, unapproved records, markup, and visitors', async () => {
    const hoshi = await record('Hoshi-kagura');
    const other = await record('Tsuki-kagami');
    const proposal = await record('Yuzuki-beni', { status: 'proposed' });
    const tour = await published('Fernhollow Garden Club: lantern walk (fictional)');
    await makeTrackRow(ds(), tour.id, ['Hoshi-kagura, then Tsuki-kagami, then Hoshi kagurra.', 'Yuzuki beni is new.']);

    const same = await viewer.post('/api/spelling-fixes', { proposedText: 'Hoshi-kagura', cultivarId: hoshi.id });
    expect(same.status).toBe(400);
    expect(same.body.error.code).toBe('already_accepted_name');

    const renaming = await viewer.post('/api/spelling-fixes', { proposedText: 'Tsuki-kagami', cultivarId: hoshi.id });
    expect(renaming.status).toBe(400);
    expect(renaming.body.error.code).toBe('is_other_name');
    expect(renaming.body.error.message).toContain(other.acceptedName);

    const unapproved = await viewer.post('/api/spelling-fixes', { proposedText: 'Yuzuki beni', cultivarId: proposal.id });
    expect(unapproved.status).toBe(400);
    expect(unapproved.body.error.fields.cultivarId).toBeTruthy();

    const markup = await viewer.post('/api/spelling-fixes', { proposedText: '<i>Hoshi kagurra</i>', cultivarId: hoshi.id });
    expect(markup.status).toBe(400);
    expect(markup.body.error.code).toBe('invalid_input');

    expect((await anonymous.post('/api/spelling-fixes', { proposedText: 'Hoshi kagurra', cultivarId: hoshi.id })).status).toBe(401);
    expect(await ds().getRepository(SpellingFix).countBy({ cultivarId: hoshi.id })).toBe(0);
  });
});

describe('flag rate limit', () => {
  it('answers 429 after FLAG_LIMIT flags in the window, per person', async () => {
    const { agent: busy } = await agentAs(server, 'viewer');
    for (let i = 0; i < FLAG_LIMIT; i++) expect((await busy.post('/api/spelling-fixes', { proposedText: 'x', cultivarId: 1 })).status).toBe(400);
    const limited = await busy.post('/api/spelling-fixes', { proposedText: 'x', cultivarId: 1 });
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('rate_limited');
    // Someone else is not held back.
    expect((await otherViewer.post('/api/spelling-fixes', { proposedText: 'x', cultivarId: 1 })).status).toBe(400);
  });
});

describe('permissions on the queue and the decisions', () => {
  it('lets moderators and admins work the queue; viewers and authors get 403, visitors 401', async () => {
    const rec = await record('Mizu-kagari');
    const tour = await published('Fernhollow Garden Club: stream walk (fictional)');
    await makeTrackRow(ds(), tour.id, ['Mizu kagarri by the stream.', 'Mizu kagarry again.', 'Mizu kagary once more.']);
    const flag = async (text: string) => (await viewer.post('/api/spelling-fixes', { proposedText: text, cultivarId: rec.id })).body.fix.id as number;
    const a = await flag('Mizu kagarri');
    const b = await flag('Mizu kagarry');
    const c = await flag('Mizu kagary');

    for (const [who, status] of [[anonymous, 401], [viewer, 403], [author, 403]] as const) {
      expect((await who.get('/api/spelling-fixes')).status).toBe(status);
      expect((await who.post('/api/spelling-fixes/detect', {})).status).toBe(status);
      expect((await who.post(`/api/spelling-fixes/${a}/accept`)).status).toBe(status);
      expect((await who.post(`/api/spelling-fixes/${a}/decline`, { reason: 'Not a misspelling.' })).status).toBe(status);
      expect((await who.post(`/api/spelling-fixes/${a}/undo`)).status).toBe(status);
    }
    // Nothing was decided by those attempts.
    expect((await ds().getRepository(SpellingFix).findOneByOrFail({ id: a })).status).toBe('open');

    // The proposer may read their own fix (without the audit); another viewer may not.
    expect((await viewer.get(`/api/spelling-fixes/${a}`)).status).toBe(200);
    expect((await otherViewer.get(`/api/spelling-fixes/${a}`)).status).toBe(404);
    expect((await anonymous.get(`/api/spelling-fixes/${a}`)).status).toBe(401);

    expect((await moderator.get('/api/spelling-fixes')).status).toBe(200);
    expect((await admin.get('/api/spelling-fixes?status=declined')).status).toBe(200);
    expect((await moderator.post(`/api/spelling-fixes/${a}/accept`)).status).toBe(200);
    expect((await admin.post(`/api/spelling-fixes/${b}/accept`)).status).toBe(200);
    expect((await admin.post(`/api/spelling-fixes/${b}/undo`)).status).toBe(200);
    expect((await admin.post(`/api/spelling-fixes/${c}/decline`, { reason: 'Checked with the narrator.' })).status).toBe(200);
  });
});

describe('accepting a fix', () => {
  it('rewrites every affected caption across tours as whole words, audits each cue, bumps track versions, adds the variant and mails the proposer', async () => {
    const rec = await record('Kaze-no-oto');
    const spring = await published('Fernhollow Garden Club: spring walk, part 1 (fictional)');
    const autumn = await published('Fernhollow Garden Club: autumn walk, part 2 (fictional)');
    const unpublished = await draft('Fernhollow Garden Club: winter walk, draft (fictional)');
    const a = await makeTrackRow(ds(), spring.id, [
      'Here is Kaze no otto by the gate.',
      'Kaze no otto, Kaze no otto again!',
      'Kaze no ottoman is a different word.',
      'Xkaze no otto hides inside another word.',
      '<i>kaze  no-otto</i> in italics.',
      'Kaze-no-oto is already right.',
    ]);
    const b = await makeTrackRow(ds(), autumn.id, ['Our KAZE NO OTTO is taller now.', 'Nothing named here.']);
    const c = await makeTrackRow(ds(), unpublished.id, ['Kaze no otto in the draft, too.']);
    const untouched = await makeTrackRow(ds(), autumn.id, ['Pas de nom ici.'], 'fr');
    const before = { a: await cueTexts(ds(), a.id), b: await cueTexts(ds(), b.id), c: await cueTexts(ds(), c.id) };
    const cueIdsA = (await cueRows(ds(), a.id)).map((r) => r.id);

    const flag = await viewer.post('/api/spelling-fixes', { proposedText: 'Kaze no otto', cultivarId: rec.id, cue: { trackId: a.id, startMs: 0 } });
    expect(flag.status).toBe(201);
    const id = flag.body.fix.id;

    // The queue row counts the cues an accept would change, in all tours, drafts included.
    const queue = await moderator.get('/api/spelling-fixes?status=open&pageSize=100');
    expect(() => spellingFixPage.parse(queue.body)).not.toThrow();
    const row = queue.body.items.find((x: { id: number }) => x.id === id);
    expect(row).toMatchObject({
      proposedText: 'Kaze no otto',
      occurrences: 5,
      toursAffected: { count: 3 },
      proposer: viewerUser.displayName,
      source: 'viewer',
    });
    expect(row.toursAffected.titles).toEqual([autumn.title, spring.title, unpublished.title].sort((x, y) => x.localeCompare(y)));

    const r = await moderator.post(`/api/spelling-fixes/${id}/accept`);
    expect(r.status).toBe(200);
    expect(() => acceptFixResponseSchema.parse(r.body)).not.toThrow();
    expect(r.body.changedCues).toBe(5);
    expect(r.body.changedTracks).toBe(3);
    expect(r.body.fix.status).toBe('accepted');
    expect(r.body.fix.decidedBy).toBeTruthy();

    expect(await cueTexts(ds(), a.id)).toEqual([
      'Here is Kaze-no-oto by the gate.',
      'Kaze-no-oto, Kaze-no-oto again!',
      'Kaze no ottoman is a different word.',
      'Xkaze no otto hides inside another word.',
      '<i>Kaze-no-oto</i> in italics.',
      'Kaze-no-oto is already right.',
    ]);
    expect(await cueTexts(ds(), b.id)).toEqual(['Our Kaze-no-oto is taller now.', 'Nothing named here.']);
    expect(await cueTexts(ds(), c.id)).toEqual(['Kaze-no-oto in the draft, too.']);

    // One audit row per rewritten cue, before and after exactly as stored.
    const detail = await moderator.get(`/api/spelling-fixes/${id}`);
    expect(detail.body.fix.changes.map((x: any) => [x.cueId, x.before, x.after, x.tourTitle])).toEqual([
      [cueIdsA[0], before.a[0], 'Here is Kaze-no-oto by the gate.', spring.title],
      [cueIdsA[1], before.a[1], 'Kaze-no-oto, Kaze-no-oto again!', spring.title],
      [cueIdsA[4], before.a[4], '<i>Kaze-no-oto</i> in italics.', spring.title],
      [(await cueRows(ds(), b.id))[0]!.id, before.b[0], 'Our Kaze-no-oto is taller now.', autumn.title],
      [(await cueRows(ds(), c.id))[0]!.id, before.c[0], 'Kaze-no-oto in the draft, too.', unpublished.title],
    ]);
    expect(detail.body.fix.changes[1]).toMatchObject({ startMs: 4000, endMs: 7500, trackId: a.id, tourId: spring.id });
    // The proposer sees the decision but not the audit (it may show drafts).
    expect((await viewer.get(`/api/spelling-fixes/${id}`)).body.fix.changes).toEqual([]);

    expect([await trackVersion(ds(), a.id), await trackVersion(ds(), b.id), await trackVersion(ds(), c.id), await trackVersion(ds(), untouched.id)]).toEqual([2, 2, 2, 1]);
    // An editor that loaded version 1 now gets a conflict instead of overwriting the fix.
    const stale = await author.call('PUT', `/api/tracks/${a.id}/cues`, { version: 1, cues: [{ startMs: 0, endMs: 1000, text: 'Kaze no otto' }] });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version_conflict');

    expect(await variantTexts(ds(), rec.id)).toEqual(['Kaze no otto']);
    const mail = await waitForMail(admin, viewerUser.email, 'Your spelling fix was accepted');
    expect(mail.subject).toBe('Your spelling fix was accepted');
    expect(mail.text).toContain("Acer palmatum 'Kaze-no-oto'");
    expect(mail.text).toContain('5 captions in 3 tours');

    const twice = await moderator2.post(`/api/spelling-fixes/${id}/accept`);
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('fix_not_open');
  });

  it('answers 409 fix_stale when the text no longer occurs anywhere, changes nothing, and the fix can then be declined', async () => {
    const rec = await record('Hana-akari');
    const tour = await published('Fernhollow Garden Club: terrace walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Hana akkari on the terrace.']);
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Hana akkari', cultivarId: rec.id })).body.fix.id;

    // The author corrects the caption by hand before a moderator gets to the fix.
    const saved = await author.call('PUT', `/api/tracks/${track.id}/cues`, { version: 1, cues: [{ startMs: 0, endMs: 3500, text: 'Hana-akari on the terrace.' }] });
    expect(saved.status).toBe(200);
    const versionBefore = await trackVersion(ds(), track.id);

    const r = await moderator.post(`/api/spelling-fixes/${id}/accept`);
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('fix_stale');
    expect(r.body.error.message).toContain('no longer occurs');
    expect(await trackVersion(ds(), track.id)).toBe(versionBefore);
    expect(await variantTexts(ds(), rec.id)).toEqual([]);
    expect(await ds().getRepository(SpellingFixChange).countBy({ fixId: id })).toBe(0);

    const declined = await moderator.post(`/api/spelling-fixes/${id}/decline`, { reason: 'Already corrected by the author.' });
    expect(declined.status).toBe(200);
    expect(declined.body.fix.status).toBe('declined');
  });
});

describe('declining a fix', () => {
  it('records the reason, leaves the captions alone and e-mails the proposer with the reason', async () => {
    const rec = await record('Tsuyu-hikari');
    const tour = await published('Fernhollow Garden Club: rain walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Tsuyu hikkari glistens after rain.']);
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Tsuyu hikkari', cultivarId: rec.id })).body.fix.id;

    const noReason = await moderator.post(`/api/spelling-fixes/${id}/decline`, {});
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toBeTruthy();

    const r = await moderator.post(`/api/spelling-fixes/${id}/decline`, { reason: 'The narrator names a different tree here.' });
    expect(r.status).toBe(200);
    expect(r.body.fix).toMatchObject({ status: 'declined', declineReason: 'The narrator names a different tree here.' });
    expect(await cueTexts(ds(), track.id)).toEqual(['Tsuyu hikkari glistens after rain.']);
    expect(await trackVersion(ds(), track.id)).toBe(1);

    const mail = await waitForMail(admin, viewerUser.email, 'Your spelling fix was declined');
    expect(mail.text).toContain('Reason: The narrator names a different tree here.');
    expect(mail.text).toContain("Acer palmatum 'Tsuyu-hikari'");

    const declinedList = await moderator.get('/api/spelling-fixes?status=declined&pageSize=100');
    expect(declinedList.body.items.map((x: { id: number }) => x.id)).toContain(id);
    expect((await moderator.post(`/api/spelling-fixes/${id}/accept`)).body.error.code).toBe('fix_not_open');
  });
});

describe('undo', () => {
  it('restores every audited cue exactly, removes the variant the accept added and bumps the versions again', async () => {
    const rec = await record('Kiri-no-mori');
    const t1 = await published('Fernhollow Garden Club: mist walk (fictional)');
    const t2 = await published('Fernhollow Garden Club: grove walk (fictional)');
    const a = await makeTrackRow(ds(), t1.id, ['Kiri  no  mory, in the mist;', 'then <b>kiri no mory</b>!']);
    const b = await makeTrackRow(ds(), t2.id, ["The kiri-no-mory's leaves turn late."]);
    const original = { a: await cueTexts(ds(), a.id), b: await cueTexts(ds(), b.id) };
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Kiri no mory', cultivarId: rec.id })).body.fix.id;
    expect((await moderator.post(`/api/spelling-fixes/${id}/accept`)).body.changedCues).toBe(3);
    expect(await cueTexts(ds(), b.id)).toEqual(["The Kiri-no-mori's leaves turn late."]);
    expect(await variantTexts(ds(), rec.id)).toEqual(['Kiri no mory']);

    const r = await moderator2.post(`/api/spelling-fixes/${id}/undo`);
    expect(r.status).toBe(200);
    expect(() => undoFixResponseSchema.parse(r.body)).not.toThrow();
    expect(r.body.restoredCues).toBe(3);
    expect(r.body.fix.status).toBe('undone');
    expect(r.body.fix.undoneBy).toBeTruthy();
    expect(await cueTexts(ds(), a.id)).toEqual(original.a);
    expect(await cueTexts(ds(), b.id)).toEqual(original.b);
    expect(await variantTexts(ds(), rec.id)).toEqual([]);
    expect([await trackVersion(ds(), a.id), await trackVersion(ds(), b.id)]).toEqual([3, 3]);

    const again = await moderator.post(`/api/spelling-fixes/${id}/undo`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('fix_not_accepted');
  });

  it('keeps a variant that was recorded before the accept', async () => {
    const rec = await record('Ame-no-ito');
    await addVariantRow(ds(), rec.id, 'Ame no itto');
    const tour = await published('Fernhollow Garden Club: drizzle walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Ame no itto hangs like thread.']);
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Ame no itto', cultivarId: rec.id })).body.fix.id;
    expect((await moderator.post(`/api/spelling-fixes/${id}/accept`)).status).toBe(200);
    expect((await moderator.post(`/api/spelling-fixes/${id}/undo`)).status).toBe(200);
    expect(await cueTexts(ds(), track.id)).toEqual(['Ame no itto hangs like thread.']);
    expect(await variantTexts(ds(), rec.id)).toEqual(['Ame no itto']);
  });

  it('refuses with 409 undo_conflict when a cue was edited after the fix, listing it, and changes nothing', async () => {
    const rec = await record('Hotaru-bi');
    const tour = await published('Fernhollow Garden Club: evening walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Hotaru bee glows at dusk.', 'Look again: Hotaru bee.']);
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Hotaru bee', cultivarId: rec.id })).body.fix.id;
    expect((await moderator.post(`/api/spelling-fixes/${id}/accept`)).body.changedCues).toBe(2);
    const fixedRows = await cueRows(ds(), track.id);

    // The author edits the second caption afterwards (through the editor, at the new version).
    const loaded = await author.get(`/api/tracks/${track.id}`);
    const cues = loaded.body.cues.map((c: any) => ({ ...c, text: c.startMs === 4000 ? 'Look again: Hotaru-bi, by the lantern.' : c.text }));
    expect((await author.call('PUT', `/api/tracks/${track.id}/cues`, { version: loaded.body.track.version, cues })).status).toBe(200);
    const afterEdit = await cueTexts(ds(), track.id);
    const versionAfterEdit = await trackVersion(ds(), track.id);

    const r = await moderator.post(`/api/spelling-fixes/${id}/undo`);
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('undo_conflict');
    expect(r.body.error.message).toContain('Nothing was undone');
    expect(r.body.error.message).toContain(`${tour.title} at 0:04`);
    expect(Object.keys(r.body.error.fields)).toEqual([`cue-${fixedRows[1]!.id}`]);
    expect(r.body.error.fields[`cue-${fixedRows[1]!.id}`]).toContain('Look again: Hotaru-bi, by the lantern.');

    // Nothing changed: neither the edited cue nor the one that could have been restored.
    expect(await cueTexts(ds(), track.id)).toEqual(afterEdit);
    expect(afterEdit).toEqual(['Hotaru-bi glows at dusk.', 'Look again: Hotaru-bi, by the lantern.']);
    expect(await trackVersion(ds(), track.id)).toBe(versionAfterEdit);
    expect((await ds().getRepository(SpellingFix).findOneByOrFail({ id })).status).toBe('accepted');
    expect(await variantTexts(ds(), rec.id)).toEqual(['Hotaru bee']);
  });

  it('still undoes after the editor re-saved the track without changing those cues (new rows, same text and time)', async () => {
    const rec = await record('Yume-kazura');
    const tour = await published('Fernhollow Garden Club: dream walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Yume kazzura climbs the arch.', 'An unnamed tree.']);
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Yume kazzura', cultivarId: rec.id })).body.fix.id;
    expect((await moderator.post(`/api/spelling-fixes/${id}/accept`)).status).toBe(200);
    const oldIds = (await cueRows(ds(), track.id)).map((c) => c.id);

    const loaded = await author.get(`/api/tracks/${track.id}`);
    const cues = loaded.body.cues.map((c: any) => (c.startMs === 4000 ? { ...c, text: 'An unnamed tree, perhaps a seedling.' } : c));
    expect((await author.call('PUT', `/api/tracks/${track.id}/cues`, { version: loaded.body.track.version, cues })).status).toBe(200);
    expect((await cueRows(ds(), track.id)).map((c) => c.id).some((cid) => oldIds.includes(cid))).toBe(false);

    const r = await moderator.post(`/api/spelling-fixes/${id}/undo`);
    expect(r.status).toBe(200);
    expect(await cueTexts(ds(), track.id)).toEqual(['Yume kazzura climbs the arch.', 'An unnamed tree, perhaps a seedling.']);
  });
});

describe('two moderators at once', () => {
  it('accepting two fixes that touch the same cues at the same moment keeps both corrections and a chained audit', async () => {
    const hoshi = await record('Hoshi-no-kawa');
    const tsuki = await record('Tsuki-no-fune');
    // Three rounds on fresh captions: the race between the two accepts is timing-dependent.
    for (let round = 1; round <= 3; round++) {
      const tour = await published(`Fernhollow Garden Club: night walk ${round} (fictional)`);
      const lines = Array.from({ length: 12 }, (_, i) => `Stop ${i}: Hoshi no kava beside Tsuki no funne.`);
      const t1 = await makeTrackRow(ds(), tour.id, lines);
      const t2 = await makeTrackRow(ds(), tour.id, lines.slice(0, 6), 'de');
      const x = (await viewer.post('/api/spelling-fixes', { proposedText: 'Hoshi no kava', cultivarId: hoshi.id })).body.fix.id;
      const y = (await viewer.post('/api/spelling-fixes', { proposedText: 'Tsuki no funne', cultivarId: tsuki.id })).body.fix.id;

      const [rx, ry] = await Promise.all([moderator.post(`/api/spelling-fixes/${x}/accept`), moderator2.post(`/api/spelling-fixes/${y}/accept`)]);
      expect([rx.status, ry.status]).toEqual([200, 200]);
      expect([rx.body.changedCues, ry.body.changedCues]).toEqual([18, 18]);

      const expected = (i: number) => `Stop ${i}: Hoshi-no-kawa beside Tsuki-no-fune.`;
      expect(await cueTexts(ds(), t1.id)).toEqual(lines.map((_, i) => expected(i)));
      expect(await cueTexts(ds(), t2.id)).toEqual(lines.slice(0, 6).map((_, i) => expected(i)));
      // Each accept moved each track on once.
      expect([await trackVersion(ds(), t1.id), await trackVersion(ds(), t2.id)]).toEqual([3, 3]);

      // The later accept's "before" is the earlier accept's "after", cue by cue.
      const audit = await ds().getRepository(SpellingFixChange).find({ where: [{ fixId: x }, { fixId: y }], order: { id: 'ASC' } });
      expect(audit).toHaveLength(36);
      const byCue = new Map<number, SpellingFixChange[]>();
      for (const row of audit) byCue.set(row.cueId, [...(byCue.get(row.cueId) ?? []), row]);
      expect(byCue.size).toBe(18);
      for (const [, rows] of byCue) {
        expect(rows).toHaveLength(2);
        expect(rows[1]!.beforeText).toBe(rows[0]!.afterText);
      }
    }
  });

  it('two moderators accepting the same fix at once: one wins, the other gets 409, and each cue changes once', async () => {
    const rec = await record('Mori-no-kage');
    const tour = await published('Fernhollow Garden Club: shade walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, ['Mori no kague, left.', 'Mori no kague, right.']);
    const id = (await viewer.post('/api/spelling-fixes', { proposedText: 'Mori no kague', cultivarId: rec.id })).body.fix.id;
    const results = await Promise.all([moderator.post(`/api/spelling-fixes/${id}/accept`), moderator2.post(`/api/spelling-fixes/${id}/accept`)]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect(await cueTexts(ds(), track.id)).toEqual(['Mori-no-kage, left.', 'Mori-no-kage, right.']);
    expect(await ds().getRepository(SpellingFixChange).countBy({ fixId: id })).toBe(2);
    expect(await trackVersion(ds(), track.id)).toBe(2);
  });
});

describe('name detection over captions (shared matcher)', () => {
  it('opens fixes for misspelt, split or re-hyphenated invented names and leaves correct names alone', async () => {
    const flame = await record('Brindlewick Flame');
    const kagura = await record('Yoru-kagura');
    const tour = await published('Fernhollow Garden Club: detection walk (fictional)');
    const track = await makeTrackRow(ds(), tour.id, [
      'First the Brindlewik Flame by the wall.',
      'Then yoru kagura, hyphens dropped.',
      'The Brindlewick Flame is spelt right here.',
      'And Yoru-kagura is spelt right too.',
      'No names in this line about compost.',
    ]);

    const r = await moderator.post('/api/spelling-fixes/detect', { trackId: track.id });
    expect(r.status).toBe(200);
    expect(r.body.report).toEqual({ tracks: 1, cues: 5, misspellings: 2, proposed: 2, known: 0 });

    const fixes = await ds().getRepository(SpellingFix).find({ where: [{ cultivarId: flame.id }, { cultivarId: kagura.id }], order: { id: 'ASC' } });
    expect(fixes.map((f) => [f.proposedText, f.cultivarId, f.source, f.proposerId, f.status])).toEqual([
      ['Brindlewik Flame', flame.id, 'detection', null, 'open'],
      ['yoru kagura', kagura.id, 'detection', null, 'open'],
    ]);
    const queue = await moderator.get('/api/spelling-fixes?pageSize=100');
    expect(queue.body.items.find((x: { id: number }) => x.id === fixes[0]!.id)).toMatchObject({ proposer: 'automatic', source: 'detection', occurrences: 1 });

    // Running again proposes nothing new; a declined detection is not proposed again either.
    expect((await moderator.post(`/api/spelling-fixes/${fixes[1]!.id}/decline`, { reason: 'The narrator reads the name aloud; spacing is fine here.' })).status).toBe(200);
    const again = await admin.post('/api/spelling-fixes/detect', { trackId: track.id });
    expect(again.body.report).toMatchObject({ misspellings: 2, proposed: 0, known: 2 });

    // Accepting the detected fix corrects the caption; nobody is mailed for an automatic fix.
    expect((await moderator.post(`/api/spelling-fixes/${fixes[0]!.id}/accept`)).status).toBe(200);
    expect((await cueTexts(ds(), track.id))[0]).toBe('First the Brindlewick Flame by the wall.');
  });

  it('runs over every track when no track is given', async () => {
    const rec = await record('Sayo-shigure');
    const t1 = await published('Fernhollow Garden Club: first drizzle walk (fictional)');
    const t2 = await draft('Fernhollow Garden Club: second drizzle walk, draft (fictional)');
    await makeTrackRow(ds(), t1.id, ['Sayo shigurre in the morning.']);
    await makeTrackRow(ds(), t2.id, ['Sayo shigurre in the draft.', 'Sayo shigorre, misheard.']);
    const r = await moderator.post('/api/spelling-fixes/detect', {});
    expect(r.status).toBe(200);
    expect(r.body.report.proposed).toBeGreaterThanOrEqual(2);
    const texts = (await ds().getRepository(SpellingFix).findBy({ cultivarId: rec.id, source: 'detection' })).map((f) => f.proposedText).sort();
    expect(texts).toEqual(['Sayo shigorre', 'Sayo shigurre']);
  });
});
