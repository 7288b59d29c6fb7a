"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useToast } from "@/components/toast/toast-provider";
import { Button } from "@/components/ui/button";
import { TextAreaField } from "@/components/ui/field";
import { Panel } from "@/components/ui/panel";
import { errorMessage } from "@/lib/client/api-fetch";
import { formatTimestamp } from "@/lib/client/format";
import { usePattern } from "@/lib/client/patterns/use-pattern";
import { useReviewDecision } from "@/lib/client/patterns/use-review";
import type { PatternDto } from "@/lib/patterns-store/pattern-dto";
import type { ReviewDecision, ReviewStatus } from "@/lib/reviews/review-decisions";
import { reviewBodySchema } from "@/lib/validations/patterns";

export const REVIEW_STATUS_TEXT: Record<ReviewStatus, string> = {
  pending: "Waiting for review",
  approved: "Approved for cutting",
  changes_requested: "Changes requested",
};

const STATUS_STYLE: Record<ReviewStatus, string> = {
  pending: "border-kraft-500 text-kraft-700",
  approved: "border-foam-600 bg-foam-400/15 text-foam-800",
  changes_requested: "border-ember-700 text-ember-700",
};

/** Review status and history; reviewers and owners approve or ask for changes (a comment is then required). */
export function ReviewPanel({ initial, canDecide }: { initial: PatternDto; canDecide: boolean }) {
  const pattern = usePattern(initial.id, initial);
  const decide = useReviewDecision(initial.id);
  const toast = useToast();
  const router = useRouter();
  const [comment, setComment] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const p = pattern.data ?? initial;

  const submit = (decision: ReviewDecision) => {
    const body = { decision, comment: comment.trim() || undefined };
    const parsed = reviewBodySchema.safeParse(body);
    if (!parsed.success) {
      setProblem(parsed.error.issues[0]?.message ?? "Check the comment.");
      return;
    }
    setProblem(null);
    decide.mutate(body, {
      onSuccess: () => {
        setComment("");
        toast.success(decision === "approve" ? "Pattern approved: fabricators can download it now." : "Changes requested; the designer can see your comment.");
        router.refresh();
      },
      onError: (err) => toast.error(errorMessage(err)),
    });
  };

  return (
    <Panel title="Review">
      <p className={`inline-block border px-2 py-0.5 text-xs font-bold uppercase tracking-wider ${STATUS_STYLE[p.reviewStatus]}`} data-testid="review-status">
        {REVIEW_STATUS_TEXT[p.reviewStatus]}
      </p>
      {p.reviews.length > 0 ? (
        <ol className="mt-3 flex flex-col gap-2 text-sm">
          {p.reviews.map((r) => (
            <li key={r.id} className="border-l-2 border-kraft-200 pl-3">
              <p className="text-xs text-kraft-700">
                {formatTimestamp(r.createdAt)} · {r.reviewer?.name ?? "former member"} · {r.decision === "approve" ? "approved" : "asked for changes"}
              </p>
              {r.comment ? <p className="whitespace-pre-wrap break-words">{r.comment}</p> : null}
            </li>
          ))}
        </ol>
      ) : (
        <p className="mt-3 text-sm text-kraft-700">No review decisions yet.</p>
      )}
      {canDecide ? (
        <form className="mt-4 flex flex-col gap-3" aria-label="Review decision" onSubmit={(e) => e.preventDefault()}>
          <TextAreaField
            id="review-comment"
            label="Comment"
            hint="Required when you ask for changes: say which piece and what to change."
            value={comment}
            error={problem ?? undefined}
            onChange={(e) => setComment(e.target.value)}
          />
          <div className="flex flex-wrap gap-2">
            <Button type="button" busy={decide.isPending && decide.variables?.decision === "approve"} disabled={decide.isPending} onClick={() => submit("approve")}>
              Approve pattern
            </Button>
            <Button type="button" variant="secondary" busy={decide.isPending && decide.variables?.decision === "request_changes"} disabled={decide.isPending} onClick={() => submit("request_changes")}>
              Request changes
            </Button>
          </div>
        </form>
      ) : null}
    </Panel>
  );
}
