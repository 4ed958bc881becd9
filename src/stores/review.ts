/**
 * Review of the open study: comments, review requests and state, the decision history, and the team members
 * who can be mentioned or asked. Every write goes to the server and then refreshes the affected list.
 */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { reviewApi } from '@/api/review';
import { teamApi } from '@/api/team';
import type {
  CommentCreateInput,
  DecisionCreateInput,
  DesignSearchResult,
  ReviewRequestState,
  ReviewRequestView,
  ReviewVerdict,
  StudyReview,
} from '@shared/schemas/review.ts';
import type { CommentRow, DecisionPreviewRow, DecisionRow, Member } from '@shared/api/review.ts';
import { useReviewQueueStore } from './review-queue';
import { errorMessage } from '@/api/errors';

export type { StudyReview, StudyReviewState } from '@shared/schemas/review.ts';
export type RequestState = ReviewRequestState;
export type RequestRow = ReviewRequestView;
export type { ViewState } from '@shared/api/review.ts';

export type { CommentRow, DecisionPreviewRow, DecisionRow, FrozenPoint, Member } from '@shared/api/review.ts';

export const useReviewStore = defineStore('review', () => {
  const studyId = ref<string | null>(null);
  const comments = ref<CommentRow[]>([]);
  const review = ref<StudyReview | null>(null);
  const decisions = ref<DecisionRow[]>([]);
  const members = ref<Member[]>([]);
  const loading = ref(false);
  const error = ref<string | null>(null);

  const current = computed(() => decisions.value.find((d) => d.status === 'signed') ?? null);
  const reviewers = computed(() => members.value.filter((m) => m.role === 'reviewer'));

  /** The open study (every call below but the sign-off search needs one). */
  const sid = (): string => {
    if (!studyId.value) throw new Error('no study is open');
    return studyId.value;
  };

  async function refreshReview(): Promise<void> {
    review.value = await reviewApi.review(sid());
  }
  async function refreshDecisions(): Promise<void> {
    decisions.value = await reviewApi.decisions(sid());
  }
  async function refreshComments(): Promise<void> {
    comments.value = await reviewApi.comments(sid());
  }

  async function load(id: string): Promise<void> {
    if (studyId.value !== id) {
      comments.value = [];
      decisions.value = [];
      review.value = null;
    }
    studyId.value = id;
    loading.value = true;
    error.value = null;
    try {
      const [team] = await Promise.all([
        teamApi.team(),
        refreshReview(),
        refreshDecisions(),
        refreshComments(),
      ]);
      members.value = team.members;
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      loading.value = false;
    }
  }

  async function addComment(input: CommentCreateInput): Promise<CommentRow> {
    const row = await reviewApi.addComment(sid(), input);
    comments.value = [...comments.value, row];
    return row;
  }

  async function askReviewers(reviewerIds: string[], message: string): Promise<void> {
    await reviewApi.askReviewers(sid(), reviewerIds, message);
    await refreshReview();
  }

  async function answer(requestId: string, state: ReviewVerdict, note: string): Promise<void> {
    await reviewApi.answer(requestId, state, note);
    await refreshReview();
    // The header's count of open requests follows.
    void useReviewQueueStore().refresh();
  }

  /** Named by study: the sign-off form searches before this store has loaded the study. */
  async function searchDesigns(forStudy: string, q: string, limit = 20): Promise<DesignSearchResult> {
    return reviewApi.searchDesigns(forStudy, q, limit);
  }

  async function checkDesign(forStudy: string, design: DecisionCreateInput['design'], label?: string, targetSheetId?: string): Promise<DecisionPreviewRow> {
    return reviewApi.checkDesign(forStudy, design, label, targetSheetId);
  }

  async function decide(input: DecisionCreateInput): Promise<DecisionRow> {
    const row = await reviewApi.decide(sid(), input);
    await Promise.all([refreshDecisions(), refreshReview()]);
    return row;
  }

  async function signDraft(id: string): Promise<void> {
    await reviewApi.sign(id);
    await Promise.all([refreshDecisions(), refreshReview()]);
  }

  async function deleteDraft(id: string): Promise<void> {
    await reviewApi.deleteDraft(id);
    decisions.value = decisions.value.filter((d) => d.id !== id);
  }

  return {
    studyId, comments, review, decisions, members, loading, error, current, reviewers,
    load, addComment, askReviewers, answer, decide, signDraft, deleteDraft, searchDesigns, checkDesign,
  };
});
