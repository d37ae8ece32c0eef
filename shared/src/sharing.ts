/** Remote review contracts: shares, invitations, comments, recommendations, photo requests, e-mail. */

export const SHARE_SCOPES = ['kart', 'case'] as const;
export type ShareScope = (typeof SHARE_SCOPES)[number];

export const COMMENT_MAX_LENGTH = 2000;
export const INVITATION_DAYS = 7;

/** POST /api/shares: share a kart (all its cases) or one case with a coach or a shop. */
export interface CreateShareRequest {
  scope: ShareScope;
  kartId?: string;
  caseId?: string;
  email: string;
  /** What the invitee is to you, shown on the share; it gives no account role (new accounts are racers). */
  as: 'coach' | 'shop';
}

export interface ShareDto {
  id: string;
  scope: ShareScope;
  kartId: string;
  kartName: string;
  caseId: string | null;
  inviteeEmail: string;
  as: 'coach' | 'shop';
  granteeId: string | null;
  granteeName: string | null;
  /** `active`: the grantee has access; `invited`: waiting for the invitee to sign up; `revoked`. */
  status: 'active' | 'invited' | 'revoked';
  createdAt: string;
}

export interface ShareListResponse {
  shares: ShareDto[];
}

/** POST /api/invitations/accept (signed in): the token from the e-mailed link. */
export interface AcceptInvitationRequest {
  token: string;
}

export interface AcceptInvitationResponse {
  share: ShareDto;
  /** Where the shared item is in the UI. */
  caseId: string | null;
  kartId: string;
}

export interface CommentDto {
  id: string;
  caseId: string;
  authorId: string | null;
  authorName: string;
  /** The author's part on this case: the owner is "racer", a grantee what the case was shared with them as (coach or shop). */
  authorRole: string | null;
  body: string;
  createdAt: string;
}

export interface CreateCommentRequest {
  body: string;
}

/** POST /api/cases/:id/recommendations (shared coach or shop). */
export interface RecommendCheckRequest {
  checkId: string;
  reason: string;
}

export interface RecommendationDto {
  checkId: string;
  reason: string;
  by: string;
  byName: string;
  at: string;
  /** False once the racer has recorded a result for the check. */
  pending: boolean;
}

/** POST /api/cases/:id/photo-requests (shared coach or shop). */
export interface PhotoRequestInput {
  what: string;
  checkId?: string;
}

export interface PhotoRequestDto {
  id: string;
  caseId: string;
  what: string;
  checkId: string | null;
  requestedBy: string | null;
  requestedByName: string;
  fulfilledByPhotoId: string | null;
  createdAt: string;
}

export interface PhotoDto {
  id: string;
  caseId: string;
  checkId: string | null;
  uploaderName: string;
  contentType: string;
  bytes: number;
  width: number;
  height: number;
  caption: string;
  createdAt: string;
  /** Checked download routes (session cookie required). */
  url: string;
  thumbUrl: string;
}

/** GET /api/shared-cases (coach, shop): open first, newest change first, grouped by racer in the UI. */
export interface SharedCaseSummaryDto {
  id: string;
  kartId: string;
  kartName: string;
  ownerId: string;
  ownerName: string;
  state: string;
  topCauseId: string | null;
  topCauseProbability: number | null;
  updatedAt: string;
  openedAt: string;
  comments: number;
  pendingPhotoRequests: number;
}

export const NOTICE_KINDS = ['invitation', 'comment', 'check-recommended', 'photo-requested', 'photo-added', 'case-resolved', 'case-progress'] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];
export const NOTICE_LABELS: Record<NoticeKind, string> = {
  invitation: 'Invitations to review a case',
  comment: 'New comments on a case',
  'check-recommended': 'A check recommended on your case',
  'photo-requested': 'A photo requested on your case',
  'photo-added': 'A photo added to a case',
  'case-resolved': 'A shared case resolved',
  'case-progress': 'Progress on a shared case',
};

/** Per-user e-mail settings: a kind set to false is not sent. Account e-mails (verification, reset) always are. */
export type NoticeSettings = Partial<Record<NoticeKind, boolean>>;

export interface OutboxMessageDto {
  id: string;
  kind: string;
  toEmail: string;
  subject: string;
  text: string;
  html: string;
  status: 'pending' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
}
