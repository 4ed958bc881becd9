/** Words and colours for review states, shared by the badge, the request list, the studies table and the packet page. */
import type { RequestState, StudyReviewState } from '@/stores/review';

export const STUDY_STATE_LABELS: Record<StudyReviewState, { text: string; color: string }> = {
  draft: { text: 'Draft', color: 'default' },
  in_review: { text: 'In review', color: 'processing' },
  sent_back: { text: 'Sent back', color: 'warning' },
  signed_off: { text: 'Signed off', color: 'success' },
};

export const REQUEST_STATE_LABELS: Record<RequestState, { text: string; color: string }> = {
  asked: { text: 'Waiting', color: 'default' },
  accepted: { text: 'Accepted', color: 'success' },
  sent_back: { text: 'Sent back with notes', color: 'warning' },
};

/** The reviewer's two verdicts, as the buttons say them. */
export const VERDICT_ACTIONS = { accepted: 'Accept', sent_back: 'Send back with notes' } as const;

export const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : '');
