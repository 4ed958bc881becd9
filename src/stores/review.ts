/**
 * Review of the open study: comments, review requests and state, the decision history, and the team members
 * who can be mentioned or asked. Every write goes to the server and then refreshes the affected list.
 */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { api } from '@/api/client';
import type {
  CommentCreateInput,
  DecisionCreateInput,
  DesignSearchResult,
  ReviewRequestState,
  ReviewRequestView,
  ReviewVerdict,
  StudyReview,
} from '@shared/schemas/review.ts';
import type { SheetCheck } from '@shared/targets/check.ts';
import { useReviewQueueStore } from './review-queue';
import { errorText } from './studies';

export type { StudyReview, StudyReviewState } from '@shared/schemas/review.ts';
export type RequestState = ReviewRequestState;
export type RequestRow = ReviewRequestView;
export type ViewState = Record<string, unknown>;

export interface Member {
  id: string;
  name: string;
  email: string;
  role: 'admin' | 'engineer' | 'reviewer';
}

export interface CommentRow {
  id: string;
  author: { id: string; name: string };
  body: string;
  target: { kind: 'study' | 'design' | 'chart'; ref: string | null };
  viewState: ViewState | null;
  mentions: { id: string; name: string }[];
  createdAt: string;
  link: string;
}

export interface FrozenPoint {
  steerAzDeg: number;
  steerElDeg: number;
  metrics: Record<string, unknown>;
}

export interface DecisionRow {
  id: string;
  label: string;
  design: Record<string, unknown>;
  metrics: { at: Record<string, unknown> | null; axis: 'az' | 'el'; points: FrozenPoint[]; figures: Record<string, number | boolean | null>; basis?: string };
  engineVersion: string;
  source: string | null;
  rationale: string;
  alternatives: { label: string; reason: string }[];
  signedAt: string | null;
  supersedesId: string | null;
  supersededById: string | null;
  status: 'draft' | 'signed' | 'superseded';
  decidedBy: { id: string; name: string };
  createdAt: string;
  targetSheetId: string | null;
  targetSheet: (Record<string, unknown> & { name?: string }) | null;
  check: SheetCheck | null;
  failedLimits: string[];
  justification: string;
}

/** What signing a design would record (POST …/decisions/check), for the confirmation dialog. */
export type DecisionPreviewRow = Pick<DecisionRow, 'label' | 'design' | 'metrics' | 'targetSheetId' | 'targetSheet' | 'check' | 'failedLimits'> & {
  metrics: DecisionRow['metrics'] & { basis?: string };
};

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

  const base = () => `/api/studies/${studyId.value}`;

  async function refreshReview(): Promise<void> {
    review.value = await api.get<StudyReview>(`${base()}/review`);
  }
  async function refreshDecisions(): Promise<void> {
    decisions.value = await api.get<DecisionRow[]>(`${base()}/decisions`);
  }
  async function refreshComments(): Promise<void> {
    comments.value = await api.get<CommentRow[]>(`${base()}/comments`);
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
        api.get<{ members: Member[] }>('/api/team'),
        refreshReview(),
        refreshDecisions(),
        refreshComments(),
      ]);
      members.value = team.members;
    } catch (err) {
      error.value = errorText(err);
    } finally {
      loading.value = false;
    }
  }

  async function addComment(input: CommentCreateInput): Promise<CommentRow> {
    const row = await api.post<CommentRow>(`${base()}/comments`, input);
    comments.value = [...comments.value, row];
    return row;
  }

  async function askReviewers(reviewerIds: string[], message: string): Promise<void> {
    await api.post(`${base()}/review-requests`, { reviewerIds, message });
    await refreshReview();
  }

  async function answer(requestId: string, state: ReviewVerdict, note: string): Promise<void> {
    await api.post(`/api/review-requests/${requestId}/answer`, { state, note });
    await refreshReview();
    // The header's count of open requests follows.
    void useReviewQueueStore().refresh();
  }

  /** Named by study: the sign-off form searches before this store has loaded the study. */
  async function searchDesigns(forStudy: string, q: string, limit = 20): Promise<DesignSearchResult> {
    return api.get<DesignSearchResult>(`/api/studies/${forStudy}/design-search?${new URLSearchParams({ q, limit: String(limit) })}`);
  }

  async function checkDesign(forStudy: string, design: DecisionCreateInput['design'], label?: string): Promise<DecisionPreviewRow> {
    return api.post<DecisionPreviewRow>(`/api/studies/${forStudy}/decisions/check`, { design, ...(label ? { label } : {}) });
  }

  async function decide(input: DecisionCreateInput): Promise<DecisionRow> {
    const row = await api.post<DecisionRow>(`${base()}/decisions`, input);
    await Promise.all([refreshDecisions(), refreshReview()]);
    return row;
  }

  async function signDraft(id: string): Promise<void> {
    await api.patch(`/api/decisions/${id}`, { sign: true });
    await Promise.all([refreshDecisions(), refreshReview()]);
  }

  async function deleteDraft(id: string): Promise<void> {
    await api.delete(`/api/decisions/${id}`);
    decisions.value = decisions.value.filter((d) => d.id !== id);
  }

  return {
    studyId, comments, review, decisions, members, loading, error, current, reviewers,
    load, addComment, askReviewers, answer, decide, signDraft, deleteDraft, searchDesigns, checkDesign,
  };
});
