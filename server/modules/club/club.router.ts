import { Router } from 'express';
import type { ClubService } from './club.service';

/** /api/club: the club this site serves and its members (public). */
export function clubRouter(clubs: ClubService): Router {
  const r = Router();
  r.get('/club', async (_req, res) => {
    const found = await clubs.current();
    if (!found) return res.json({ club: null });
    const { club, members } = found;
    res.json({
      club: {
        name: club.name,
        blurb: club.blurb,
        fictional: club.fictional,
        members: members.map((m) => ({ id: m.id, displayName: m.displayName, role: m.role, garden: m.garden })),
      },
    });
  });
  return r;
}
