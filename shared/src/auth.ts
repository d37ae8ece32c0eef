/** Roles, in the order the product's design lists them. New accounts are racers. */
export const ROLES = ['racer', 'coach', 'shop', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;
export const DISPLAY_NAME_MAX_LENGTH = 80;

export interface UserDto {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  emailVerified: boolean;
  createdAt: string;
}

/** POST /api/auth/sign-up (201, sets the session cookie). */
export interface SignUpRequest {
  email: string;
  password: string;
  displayName: string;
  /** The token of an invitation e-mail, when signing up through one. */
  invitationToken?: string;
}

/** POST /api/auth/verify-email and the token-only auth forms. */
export interface TokenRequest {
  token: string;
}

/** POST /api/auth/request-password-reset: always answers 202, whether or not the address has an account. */
export interface PasswordResetRequest {
  email: string;
}

/** POST /api/auth/reset-password */
export interface ResetPasswordRequest {
  token: string;
  password: string;
}

/** POST /api/auth/sign-in (200, sets the session cookie). */
export interface SignInRequest {
  email: string;
  password: string;
}

/** Body of sign-up, sign-in and GET /api/auth/me. */
export interface SessionResponse {
  user: UserDto;
  /** Sign-up through an invitation only: what was shared (the case, or the kart when `caseId` is null), to open next. */
  shared?: { caseId: string | null; kartId: string };
}

/** GET /api/users (admin). */
export interface UserListResponse {
  users: UserDto[];
}

/** PATCH /api/users/:id/role (admin). */
export interface ChangeRoleRequest {
  role: Role;
}

/** The one message for a wrong password and for an unknown e-mail (no account enumeration). */
export const SIGN_IN_FAILED_MESSAGE = 'E-mail or password is wrong.';
