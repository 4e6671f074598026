import { IsNull, type DataSource } from 'typeorm';
import { Club } from '../../db/entities/club.entity';
import { User } from '../../db/entities/user.entity';

/** The club this site serves and its members. */
export class ClubService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * The club (the first one; a site serves one), or null before setup, with its members by name:
   * of the first 200 enabled accounts, those who confirmed their address.
   */
  async current(): Promise<{ club: Club; members: User[] } | null> {
    const club = await this.dataSource.getRepository(Club).findOne({ where: {}, order: { id: 'ASC' } });
    if (!club) return null;
    const members = await this.dataSource.getRepository(User).find({
      where: { disabledAt: IsNull() },
      order: { displayName: 'ASC' },
      take: 200,
    });
    return { club, members: members.filter((m) => m.emailVerifiedAt) };
  }
}
