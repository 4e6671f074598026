import { AuthToken } from './auth-token.entity';
import { CaptionTrack } from './caption-track.entity';
import { Club } from './club.entity';
import { CueRow } from './cue.entity';
import { Cultivar } from './cultivar.entity';
import { CultivarPhoto } from './cultivar-photo.entity';
import { CultivarVariant } from './cultivar-variant.entity';
import { Job } from './job.entity';
import { LearnAttempt } from './learn-attempt.entity';
import { PairNote } from './pair-note.entity';
import { OutboxMessage } from './outbox-message.entity';
import { SpellingFix } from './spelling-fix.entity';
import { SpellingFixChange } from './spelling-fix-change.entity';
import { Stop } from './stop.entity';
import { Tour } from './tour.entity';
import { User } from './user.entity';

/** Every entity the data source knows; add new ones here. */
export const ENTITIES = [User, AuthToken, OutboxMessage, Club, Tour, Job, Cultivar, CultivarVariant, CaptionTrack, CueRow, Stop, PairNote, LearnAttempt, CultivarPhoto, SpellingFix, SpellingFixChange];
