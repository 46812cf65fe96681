/**
 * A mentor's review of a shared brew day: comments (on the whole day or on one reading or
 * decision), the review queue and the review page's data. The form and the route use the same
 * schemas, so a comment too long is refused with the same words on both sides.
 */
import { z } from 'zod';
import type { FermentationDeviation } from '../fermentation-deviations';
import { idSchema, pageCursorSchema } from './common';
import { pageSizeSchema } from './fields';
import type { BrewDetail, BrewDeviation } from './brews';
import type { FermentationReading, FermentationVerdict, PackagingRecord, TemperatureSummary } from './fermentation';

// ---------------------------------------------------------------------------------------------
// Vocabulary

/** What a comment hangs off: the whole brew day, a brew-day reading, a late-boil decision or a fermentation reading. */
export const commentTargetKinds = ['brew', 'reading', 'decision', 'fermentation_reading'] as const;
export type CommentTargetKind = (typeof commentTargetKinds)[number];

export const COMMENT_MAX_CHARS = 4000;

// ---------------------------------------------------------------------------------------------
// Requests

const idNum = idSchema;

export const commentBodySchema = z
  .string({ error: 'Write the comment.' })
  .trim()
  .min(1, { error: 'Write the comment.' })
  .max(COMMENT_MAX_CHARS, { error: `Use at most ${COMMENT_MAX_CHARS} characters.` });

export const commentTargetSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('brew') }),
    z.object({ kind: z.literal('reading'), id: idNum }),
    z.object({ kind: z.literal('decision'), id: idNum }),
    z.object({ kind: z.literal('fermentation_reading'), id: idNum }),
  ],
  { error: 'Comment on the brew day, a reading, a decision or a fermentation reading.' },
);
export type CommentTargetInput = z.input<typeof commentTargetSchema>;

/** POST /api/brews/:brewId/comments. Without a target the comment is on the whole brew day. */
export const commentInputSchema = z.object({
  body: commentBodySchema,
  target: commentTargetSchema.nullable().default(null),
});
export type CommentInput = z.input<typeof commentInputSchema>;
export type CommentBody = z.output<typeof commentInputSchema>;

export const brewParamsSchema = z.object({ brewId: idNum });
export const commentParamsSchema = z.object({ brewId: idNum, commentId: idNum });

// ---------------------------------------------------------------------------------------------
// Responses

export interface CommentTarget {
  kind: CommentTargetKind;
  /** Null for the whole brew day. */
  id: number | null;
  /** In words, e.g. "Late-boil decision" or "Fermentation reading (gravity)". */
  label: string;
  /** When the reading was taken or the decision made; null for the brew day. */
  at: string | null;
  /** The reading or decision was deleted after the comment was written. */
  missing: boolean;
}

export interface BrewComment {
  id: number;
  brewId: number;
  author: {
    id: number | null;
    name: string;
    /** The brewer replying, or a mentor of a club the brew day is shared with (or was, when the comment was written). */
    role: 'brewer' | 'mentor';
  };
  target: CommentTarget;
  body: string;
  createdAt: string;
  editedAt: string | null;
  /** Only the author may delete a comment. */
  canDelete: boolean;
}

export interface CommentCreated {
  comment: BrewComment;
  /** Whether the brewer's e-mail notice went out; null when the brewer wrote the comment. */
  noticeSent: boolean | null;
}

/** One brew day waiting for a mentor's first comment. */
export interface ReviewQueueItem {
  brewId: number;
  brewName: string;
  brewerName: string;
  recipeName: string;
  brewedOn: string;
  status: BrewDetail['status'];
  /** When it was shared with the (latest of the) clubs below. */
  sharedAt: string;
  /** The clubs, where you mentor, it is shared with and no mentor has commented on yet (on the reviewed list: those a mentor has). */
  clubs: { id: number; name: string }[];
  og: number | null;
  targetOg: number;
  /** Brew day and fermentation together, as on the review page. */
  deviationCount: number;
}

/** GET /api/reviews/queue and /api/reviews/reviewed: a page at a time, in the list's own order. */
export const reviewListQuerySchema = z.object({
  cursor: pageCursorSchema,
  pageSize: pageSizeSchema('brew day', 100, 20),
});
/** What a client asks for; the server fills in the defaults. */
export interface ReviewListQuery {
  cursor?: string;
  pageSize?: number;
}

/** One brew day a mentor of your clubs has commented on: it left the queue and is found here again. */
export interface ReviewedItem extends ReviewQueueItem {
  /** The latest comment by a mentor of the clubs listed. */
  reviewedAt: string;
}

export type ReviewDeviation = BrewDeviation | FermentationDeviation;

/** GET /api/brews/:brewId/review: the brew day, its fermentation, where it left its targets, and the comments. */
export interface BrewReview {
  brew: BrewDetail;
  fermentation: {
    readings: FermentationReading[];
    verdict: FermentationVerdict | null;
    temperature: TemperatureSummary;
    packaging: PackagingRecord | null;
  };
  /** Every deviation of the brew day (as on the brewer's log) followed by those of fermentation. */
  deviations: ReviewDeviation[];
  comments: BrewComment[];
  permissions: { comment: boolean };
}
