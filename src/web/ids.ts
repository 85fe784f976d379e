// Short random ids for new rows (the core never makes ids).
import { randomBytes } from 'node:crypto';

export const newId = (prefix: string) => `${prefix}-${randomBytes(6).toString('hex')}`;
