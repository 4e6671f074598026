import { loadConfig } from '../config';
import { createDataSource } from './data-source';

/** Used only by the TypeORM CLI (npm run db:generate / db:migrate / db:revert). */
export default createDataSource(loadConfig());
