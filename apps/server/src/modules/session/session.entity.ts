import { EntitySchema } from '@mikro-orm/core';

/** A server-side browser session (express-session data as JSON); expired rows are pruned. */
export interface SessionRecord {
  sid: string;
  data: string;
  userId: string | null;
  expiresAt: Date;
}

export const SessionSchema = new EntitySchema<SessionRecord>({
  name: 'SessionRecord',
  tableName: 'sessions',
  properties: {
    sid: { type: 'string', primary: true, length: 128 },
    data: { type: 'text' },
    userId: { type: 'string', length: 36, nullable: true, index: true },
    expiresAt: { type: 'Date', index: true },
  },
});
