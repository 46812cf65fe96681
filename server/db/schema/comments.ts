import { sql } from 'drizzle-orm';
import { index, int, mysqlEnum, mysqlTable, text, timestamp } from 'drizzle-orm/mysql-core';
import { commentTargetKinds } from '../../../shared/schemas/comments';
import { brews } from './brews';
import { users } from './users';

const stamp = (name: string) => timestamp(name, { mode: 'date', fsp: 3 });

/**
 * A comment on a brew day, by a mentor of a club it is shared with or by its brewer replying. It
 * hangs off the whole brew day (`target_kind` 'brew', no `target_id`) or off one brew-day reading,
 * late-boil decision or fermentation reading. The target has no foreign key because it points into
 * one of three tables; the service checks that it belongs to the brew day before inserting.
 */
export const comments = mysqlTable(
  'comments',
  {
    id: int('id').autoincrement().primaryKey(),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    /** Null once the author's account is gone; the comment stays with the brew day. */
    authorId: int('author_id').references(() => users.id, { onDelete: 'set null' }),
    targetKind: mysqlEnum('target_kind', commentTargetKinds).notNull().default('brew'),
    targetId: int('target_id'),
    body: text('body').notNull(),
    createdAt: stamp('created_at').notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    /** Reserved for a later edit of the comment's own text; nothing edits a comment today. */
    editedAt: stamp('edited_at'),
  },
  (t) => [index('comments_brew_idx').on(t.brewId, t.createdAt), index('comments_author_idx').on(t.authorId)],
);

export type CommentRow = typeof comments.$inferSelect;
