import type { Role } from '../../../shared/schemas/common';

/**
 * Members of the demo club. Invented people and gardens for the demo only; the shared demo
 * password is printed by `npm start` and must never be used on a public site.
 */
export const DEMO_PASSWORD = 'maple-walk-demo';

export const DEMO_CLUB = {
  name: 'Fernhollow Maple Circle',
  blurb:
    'A small garden club of container-maple growers who film slow walks through their gardens each season and help each other get the names right. (Fictional club, invented for the Grovewalk demo.)',
};

export const DEMO_MEMBERS: { email: string; displayName: string; role: Role; garden: string }[] = [
  { email: 'admin@fernhollow.example', displayName: 'Wren Abernathy', role: 'admin', garden: 'The Old Rectory Yard (fictional)' },
  { email: 'moderator@fernhollow.example', displayName: 'Tomas Quill', role: 'moderator', garden: 'Quill Terrace Pots (fictional)' },
  { email: 'author@fernhollow.example', displayName: 'Ada Pellworth', role: 'author', garden: 'Pellworth Sunken Garden (fictional)' },
  { email: 'author2@fernhollow.example', displayName: 'Rafi Oduya', role: 'author', garden: 'Oduya Courtyard (fictional)' },
  { email: 'viewer@fernhollow.example', displayName: 'Juno Mistral', role: 'viewer', garden: 'Balcony Nine (fictional)' },
];
