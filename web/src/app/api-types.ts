// The API's request and response shapes, as the web app sees them: types only, taken from the
// API's zod DTOs so that a change of contract breaks the web build instead of a user's session.
import type { Role } from '../../../api/src/workspaces/workspaces-dto';

export type {
  ForgotPasswordRequest,
  MeResponse,
  ResetPasswordRequest,
  SessionResponse,
  SignInRequest,
  SignUpRequest,
  UserResponse,
} from '../../../api/src/auth/auth-dto';
export type {
  AcceptInvitationResponse,
  AuditEventResponse,
  CreateInvitationRequest,
  CreateWorkspaceRequest,
  InvitationPreviewResponse,
  InvitationResponse,
  InvitationStatus,
  ListAuditEventsResponse,
  ListInvitationsResponse,
  ListMembersResponse,
  ListWorkspacesResponse,
  MemberResponse,
  Role,
  UpdateMemberRequest,
  UpdateWorkspaceRequest,
  WorkspaceResponse,
} from '../../../api/src/workspaces/workspaces-dto';
export type { ProblemResponse } from '../../../api/src/errors/problem-dto';
export type {
  CoilFiguresResponse,
  CoilKind,
  CoilResponse,
  CreateCoilRequest,
  DuplicateCoilRequest,
  ListCoilsQuery,
  ListCoilsResponse,
  UpdateCoilRequest,
} from '../../../api/src/coils/coils-dto';
export type {
  Compensation,
  CreateRevisionRequest,
  CreateStudyRequest,
  ListRevisionsResponse,
  ListStudiesResponse,
  RevisionResponse,
  RevisionSummaryResponse,
  StudyCoil,
  StudyPose,
  StudyResponse,
  StudySummaryResponse,
  Threshold,
  UpdateStudyRequest,
} from '../../../api/src/studies/studies-dto';
export type {
  CreateSweepRequest,
  ListSweepRunsResponse,
  MAX_STORED_SWEEP_POSES,
  SweepEnvelope,
  SweepEstimateResponse,
  SweepKind,
  SweepProgressEvent,
  SweepResultBody,
  SweepRunResponse,
  SweepStatus,
} from '../../../api/src/sweeps/sweeps-dto';
export type { SweepAxes, SweepSpec } from '../../../physics/src/index';

/**
 * The roles in the order the pickers list them, most rights first. A value, so it cannot come
 * through a type-only import; `satisfies` keeps it in step with the API's `Role`.
 */
export const roles = ['owner', 'editor', 'reviewer', 'viewer'] as const satisfies readonly Role[];

/** What each role may do, in the words of the members page. */
export const roleDescriptions: Record<Role, string> = {
  owner: 'Invites people, sets roles, owns the decision',
  editor: 'Builds coils and studies, runs sweeps, uploads bench data',
  reviewer: 'Comments on frozen revisions, approves or requests changes',
  viewer: 'Reads studies, downloads envelopes and maps',
};

/** One message captured by the development mail catcher (GET /api/v1/dev/mail). */
export interface CapturedMail {
  id: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

export interface ListCapturedMailResponse {
  items: CapturedMail[];
}
