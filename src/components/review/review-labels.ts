/** Words and colours for review states, shared by the badge, the request list and the packet page. */
import type { RequestState, StudyReviewState } from '@/stores/review';

export const STUDY_STATE_LABELS: Record<StudyReviewState, { text: string; color: string }> = {
  draft: { text: 'Draft', color: 'default' },
  in_review: { text: 'In review', color: 'processing' },
  changes_requested: { text: 'Changes requested', color: 'warning' },
  signed_off: { text: 'Signed off', color: 'success' },
};

export const REQUEST_STATE_LABELS: Record<RequestState, { text: string; color: string }> = {
  asked: { text: 'Asked', color: 'default' },
  approved: { text: 'Approved', color: 'success' },
  changes_requested: { text: 'Changes requested', color: 'warning' },
};

export const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : '');
