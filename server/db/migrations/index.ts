import { Initial1796171701674 } from './1796171701674-initial';
import { CaptionsStops1796172673735 } from './1796172673735-captions-stops';
import { Learning1796174000000 } from './1796174000000-learning';
import { SpellingFixes1796174100000 } from './1796174100000-spelling-fixes';
import { SearchRevisions1796174200000 } from './1796174200000-search-revisions';

/** Migrations in the order they run; generated, reviewed, committed and never edited once landed. */
export const MIGRATIONS = [Initial1796171701674, CaptionsStops1796172673735, Learning1796174000000, SpellingFixes1796174100000, SearchRevisions1796174200000];
