import { Router } from 'express';
import { IsNull, type DataSource } from 'typeorm';
import { Club } from '../../db/entities/club.entity';
import { User } from '../../db/entities/user.entity';

/** /api/club: the club this site serves and its members (public). */
export function clubRouter(dataSource: DataSource): Router {
  const r = Router();
  r.get('/club', async (_req, res) => {
    const club = await dataSource.getRepository(Club).findOne({ where: {}, order: { id: 'ASC' } });
    if (!club) return res.json({ club: null });
    const members = await dataSource.getRepository(User).find({
      where: { disabledAt: IsNull() },
      order: { displayName: 'ASC' },
      take: 200,
    });
    res.json({
      club: {
        name: club.name,
        blurb: club.blurb,
        fictional: club.fictional,
        members: members.filter((m) => m.emailVerifiedAt).map((m) => ({ id: m.id, displayName: m.displayName, role: m.role, garden: m.garden })),
      },
    });
  });
  return r;
}
