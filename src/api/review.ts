/** Review of a study: its state, comments, review requests, decisions, and the design search for signing. */
import type { CommentRow, DecisionPreviewRow, DecisionRow } from '@shared/api/review.ts';
import type { CommentCreateInput, DecisionCreateInput, DesignSearchResult, ReviewVerdict, StudyReview, WaitingRequest } from '@shared/schemas/review.ts';
import { api } from './client';

const study = (id: string) => `/api/studies/${encodeURIComponent(id)}`;

export const reviewApi = {
  review: (studyId: string) => api.get<StudyReview>(`${study(studyId)}/review`),
  decisions: (studyId: string) => api.get<DecisionRow[]>(`${study(studyId)}/decisions`),
  comments: (studyId: string) => api.get<CommentRow[]>(`${study(studyId)}/comments`),
  addComment: (studyId: string, input: CommentCreateInput) => api.post<CommentRow>(`${study(studyId)}/comments`, input),
  askReviewers: (studyId: string, reviewerIds: string[], message: string) => api.post<void>(`${study(studyId)}/review-requests`, { reviewerIds, message }),
  answer: (requestId: string, state: ReviewVerdict, note: string) => api.post<void>(`/api/review-requests/${encodeURIComponent(requestId)}/answer`, { state, note }),
  waiting: () => api.get<WaitingRequest[]>('/api/review-requests/waiting'),
  searchDesigns: (studyId: string, q: string, limit: number) =>
    api.get<DesignSearchResult>(`${study(studyId)}/design-search?${new URLSearchParams({ q, limit: String(limit) })}`),
  checkDesign: (studyId: string, design: DecisionCreateInput['design'], label?: string, targetSheetId?: string) =>
    api.post<DecisionPreviewRow>(`${study(studyId)}/decisions/check`, { design, ...(label ? { label } : {}), ...(targetSheetId ? { targetSheetId } : {}) }),
  decide: (studyId: string, input: DecisionCreateInput) => api.post<DecisionRow>(`${study(studyId)}/decisions`, input),
  sign: (decisionId: string) => api.patch<void>(`/api/decisions/${encodeURIComponent(decisionId)}`, { sign: true }),
  deleteDraft: (decisionId: string) => api.delete<void>(`/api/decisions/${encodeURIComponent(decisionId)}`),
};
