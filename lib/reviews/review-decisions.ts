/** Review decisions on a pattern and the review status each leaves it in. */
export const REVIEW_DECISIONS = ["approve", "request_changes"] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

export const REVIEW_STATUSES = ["pending", "approved", "changes_requested"] as const;
export type ReviewStatus = (typeof REVIEW_STATUSES)[number];

export const STATUS_AFTER: Readonly<Record<ReviewDecision, ReviewStatus>> = {
  approve: "approved",
  request_changes: "changes_requested",
};
