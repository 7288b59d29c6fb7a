/** Where a build stands, in the order a project normally moves through them. */
export const PROJECT_STATUSES = ["planning", "patterning", "in_review", "approved", "building", "delivered"] as const;
export type ProjectStatus = (typeof PROJECT_STATUSES)[number];
