/**
 * Every route path of the UI, in one place. Pages and links import from here, never spell a path.
 * (A leaf module without imports, so features may import it without pulling in the app.)
 */
export const paths = {
  landing: '/',
  quickDiagnosis: '/diagnose',
  /** Opens a case on one kart: `?kartId=<id>`. */
  diagnoseKart: '/diagnose/new',
  /** After sign-up: turns the quick diagnosis kept in this browser into a case. */
  saveQuickDiagnosis: '/diagnose/save',
  conditions: '/conditions',
  signIn: '/sign-in',
  signUp: '/sign-up',
  /** The link in an invitation e-mail: sign in or sign up, then accept (see invitationPath()). */
  invitation: '/invitations/:token',
  /** Links in account e-mails, each with `?token=`; the reset page without one asks for the address. */
  verifyEmail: '/verify-email',
  resetPassword: '/reset-password',
  unsubscribe: '/unsubscribe',
  emailSettings: '/account/e-mails',
  home: '/home',
  // racer
  karts: '/karts',
  jetting: '/jetting',
  kartJetting: '/karts/:kartId/jetting',
  kart: '/karts/:kartId',
  cases: '/cases',
  case: '/cases/:caseId',
  caseWalkThrough: '/cases/:caseId/walk-through',
  // coach
  sharedCases: '/shared-cases',
  // shop
  workOrders: '/work-orders',
  newWorkOrder: '/work-orders/new',
  workOrder: '/work-orders/:workOrderId',
  outcomes: '/outcomes',
  // shop and admin
  insights: '/insights',
  // admin
  users: '/admin/users',
  rulesets: '/admin/rulesets',
  /** One proposal of new weights (shops propose too; only admins publish). */
  rulesetProposal: '/admin/rulesets/proposals/:proposalId',
  outbox: '/admin/outbox',
} as const;

export type AppPath = (typeof paths)[keyof typeof paths];

/** The query parameter that carries the page to return to after signing in. */
export const NEXT_PARAM = 'next';

/** Only same-site paths are accepted as a return target (no `//host`, no `https:`, no backslashes). */
export function safeNextPath(raw: string | null | undefined): string | null {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.includes('\\')) return null;
  const pathname = raw.split(/[?#]/)[0];
  if (pathname === paths.signIn || pathname === paths.signUp) return null;
  return raw;
}

/** The sign-in page, remembering where to come back to. */
export function signInPath(next?: string | null): string {
  const target = safeNextPath(next);
  return target && target !== paths.landing
    ? `${paths.signIn}?${NEXT_PARAM}=${encodeURIComponent(target)}`
    : paths.signIn;
}

/** The sign-up page, keeping the return target when there is one. */
export function signUpPath(next?: string | null): string {
  const target = safeNextPath(next);
  return target ? `${paths.signUp}?${NEXT_PARAM}=${encodeURIComponent(target)}` : paths.signUp;
}

/** The jetting screen of one kart. */
export function kartJettingPath(kartId: string): string {
  return paths.kartJetting.replace(':kartId', encodeURIComponent(kartId));
}

/** The kart page's query parameter naming a setup to show highlighted in its setups list. */
export const SETUP_PARAM = 'setup';

/** A kart's page opened at its setups list (`#setups`), with one setup highlighted. */
export function kartSetupPath(kartId: string, setupId: string): string {
  return `${paths.kart.replace(':kartId', encodeURIComponent(kartId))}?${SETUP_PARAM}=${encodeURIComponent(setupId)}#setups`;
}

/** The sign-up page's query parameter that carries an invitation token. */
export const INVITATION_PARAM = 'invitation';

/** The page of one invitation link. */
export function invitationPath(token: string): string {
  return paths.invitation.replace(':token', encodeURIComponent(token));
}

/** Sign-up through an invitation: the token goes along, and the shared cases open afterwards. */
export function invitationSignUpPath(token: string): string {
  return `${paths.signUp}?${INVITATION_PARAM}=${encodeURIComponent(token)}&${NEXT_PARAM}=${encodeURIComponent(paths.sharedCases)}`;
}
