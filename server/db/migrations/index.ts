import { Initial1796171701674 } from './1796171701674-initial';

/** Migrations in the order they run; generated, reviewed, committed and never edited once landed. */
export const MIGRATIONS = [Initial1796171701674];
