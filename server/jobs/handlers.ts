import type { DataSource } from 'typeorm';
import type { MediaStorage } from '../media/storage';
import { TRANSCODE_JOB } from '../modules/tours/tour.service';
import type { JobHandler } from './runner';
import { transcodeJob } from './transcode.job';

/** Every kind of background job and its handler. */
export function jobHandlers(dataSource: DataSource, storage: MediaStorage): Record<string, JobHandler> {
  return { [TRANSCODE_JOB]: transcodeJob(dataSource, storage) };
}
