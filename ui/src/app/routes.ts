import { createElement, lazy, Suspense, type ComponentProps, type ComponentType } from 'react';
import {
  BookIcon,
  ChartIcon,
  CloudIcon,
  FilterIcon,
  ClipboardIcon,
  DiagnosisIcon,
  DriveTimeIcon,
  EndorsedIcon,
  EnvelopeIcon,
  FolderOpenIcon,
  FolderSharedIcon,
  HomeIcon,
  PeopleIcon,
  type SVGIconProps,
} from '@blueprintjs/icons';
import type { Role } from '@fuelwright/shared';
import type { Access } from './access';
import { paths } from './paths';

export type IconComponent = ComponentType<SVGIconProps>;

export interface MenuEntry {
  /** Text in the navbar and the drawer; defaults to the route's title. */
  label?: string;
  icon: IconComponent;
  /** Position in the menu, lowest first. */
  order: number;
  /** Only these roles see the entry (default: everyone who may open the route). */
  roles?: readonly Role[];
}

/** Data a page can read through `useMatches()` (title, and what a placeholder page says). */
export interface RouteHandle {
  title: string;
  /** For screens that later issues fill: one honest sentence on what will be here. */
  comingNext?: string;
}

export interface AppRoute extends RouteHandle {
  path: string;
  access: Access;
  /** Loads the page lazily: each route is its own chunk. */
  page: () => Promise<ComponentType>;
  /** Present when the route has a menu entry; the entry shows only to those who may open it. */
  menu?: MenuEntry;
}

/**
 * Every screen of the app. The router, the route guards and the navigation menu are all built
 * from this table: a new feature adds its path to paths.ts and one entry here.
 */
export const appRoutes: readonly AppRoute[] = [
  {
    path: paths.landing,
    title: 'Welcome',
    access: 'visitors',
    page: () => import('../features/home/components/landing-page').then((m) => m.LandingPage),
  },
  {
    path: paths.signIn,
    title: 'Sign in',
    access: 'visitors',
    page: () => import('../features/auth/components/sign-in-page').then((m) => m.SignInPage),
  },
  {
    path: paths.signUp,
    title: 'Create account',
    access: 'visitors',
    page: () => import('../features/auth/components/sign-up-page').then((m) => m.SignUpPage),
  },
  {
    path: paths.home,
    title: 'Home',
    access: 'signed-in',
    page: () => import('../features/home/components/home-page').then((m) => m.HomePage),
    menu: { icon: HomeIcon, order: 0 },
  },
  {
    path: paths.karts,
    title: 'Karts',
    access: ['racer'],
    page: () => import('../features/karts/components/karts-page').then((m) => m.KartsPage),
    menu: { icon: DriveTimeIcon, order: 10 },
  },
  {
    path: paths.kart,
    title: 'Kart',
    access: 'signed-in',
    page: () => import('../features/karts/components/kart-page').then((m) => m.KartPage),
  },
  {
    path: paths.jetting,
    title: 'Jetting',
    access: ['racer'],
    page: () => import('../features/jetting/components/jetting-index-page').then((m) => m.JettingIndexPage),
    menu: { icon: FilterIcon, order: 15 },
  },
  {
    path: paths.kartJetting,
    title: 'Jetting',
    access: 'signed-in',
    page: () => import('../features/jetting/components/kart-jetting-page').then((m) => m.KartJettingPage),
  },
  {
    path: paths.cases,
    title: 'Cases',
    access: ['racer'],
    page: () => import('../features/cases/components/cases-page').then((m) => m.CasesPage),
    menu: { icon: FolderOpenIcon, order: 20 },
  },
  {
    path: paths.case,
    title: 'Case',
    access: 'signed-in',
    // The app composes two features: the case page shows the review panels it is handed. They load
    // beside the page (not before it), so the case shows first.
    page: () => {
      const review = import('../features/review/components/case-review');
      const CaseReview = lazy(() => review.then((m) => ({ default: m.CaseReview })));
      const Review = (props: ComponentProps<typeof CaseReview>) => createElement(Suspense, { fallback: null }, createElement(CaseReview, props));
      const outcome = import('../features/outcomes/components/log-outcome-panel');
      const LogOutcomePanel = lazy(() => outcome.then((m) => ({ default: m.LogOutcomePanel })));
      const LogOutcome = (props: ComponentProps<typeof LogOutcomePanel>) => createElement(Suspense, { fallback: null }, createElement(LogOutcomePanel, props));
      return import('../features/cases/components/case-page').then(
        ({ CasePage }) =>
          function CaseWithReview() {
            return createElement(CasePage, { review: Review, logOutcome: LogOutcome });
          },
      );
    },
  },
  {
    path: paths.sharedCases,
    title: 'Shared cases',
    // The share grants access, not the role: an invited coach may have a racer account.
    access: 'signed-in',
    page: () => import('../features/review/components/shared-cases-page').then((m) => m.SharedCasesPage),
    menu: { icon: FolderSharedIcon, order: 20, roles: ['racer', 'coach', 'shop'] },
  },
  {
    path: paths.workOrders,
    title: 'Work orders',
    access: ['shop'],
    page: () => import('../features/outcomes/components/work-orders-page').then((m) => m.WorkOrdersPage),
    menu: { icon: ClipboardIcon, order: 20 },
  },
  {
    path: paths.newWorkOrder,
    title: 'New work order',
    access: ['shop'],
    page: () => import('../features/outcomes/components/new-work-order-page').then((m) => m.NewWorkOrderPage),
  },
  {
    path: paths.workOrder,
    title: 'Work order',
    access: ['shop'],
    page: () => import('../features/outcomes/components/work-order-page').then((m) => m.WorkOrderPage),
  },
  {
    path: paths.outcomes,
    title: 'Outcomes',
    access: ['shop', 'admin'],
    page: () => import('../features/outcomes/components/outcomes-page').then((m) => m.OutcomesPage),
    menu: { icon: EndorsedIcon, order: 30 },
  },
  {
    path: paths.insights,
    title: 'Insights',
    access: ['shop', 'admin'],
    page: () => import('../features/insights/components/insights-page').then((m) => m.InsightsPage),
    menu: { icon: ChartIcon, order: 35 },
  },
  {
    path: paths.users,
    title: 'Users',
    access: ['admin'],
    page: () => import('../features/admin-users/components/users-page').then((m) => m.UsersPage),
    menu: { icon: PeopleIcon, order: 20 },
  },
  {
    path: paths.rulesets,
    title: 'Rulesets',
    // Shops propose new weights here (reached from Insights); only admins publish, so only they get a menu entry.
    access: ['shop', 'admin'],
    page: () => import('../features/rulesets/components/rulesets-page').then((m) => m.RulesetsPage),
    menu: { icon: BookIcon, order: 40, roles: ['admin'] },
  },
  {
    path: paths.rulesetProposal,
    title: 'Proposal',
    access: ['shop', 'admin'],
    page: () => import('../features/rulesets/components/proposal-page').then((m) => m.ProposalPage),
  },
  {
    path: paths.conditions,
    title: 'Conditions',
    access: 'anyone',
    page: () => import('../features/conditions/components/conditions-page').then((m) => m.ConditionsPage),
    menu: { icon: CloudIcon, order: 80 },
  },
  {
    path: paths.quickDiagnosis,
    title: 'Quick diagnosis',
    access: 'anyone',
    page: () => import('../features/diagnosis/components/quick-diagnosis-page').then((m) => m.QuickDiagnosisPage),
    menu: { icon: DiagnosisIcon, order: 90 },
  },
  {
    path: paths.diagnoseKart,
    title: 'Diagnose a kart',
    access: ['racer'],
    page: () => import('../features/diagnosis/components/diagnose-kart-page').then((m) => m.DiagnoseKartPage),
  },
  {
    path: paths.saveQuickDiagnosis,
    title: 'Save the quick diagnosis',
    access: ['racer'],
    page: () => import('../features/diagnosis/components/save-quick-diagnosis-page').then((m) => m.SaveQuickDiagnosisPage),
  },
  {
    path: paths.caseWalkThrough,
    title: 'Walk-through',
    access: ['racer'],
    page: () => import('../features/diagnosis/components/case-walk-through-page').then((m) => m.CaseWalkThroughPage),
  },
  {
    path: paths.invitation,
    title: 'Invitation',
    access: 'anyone',
    page: () => import('../features/account/components/invitation-page').then((m) => m.InvitationPage),
  },
  {
    path: paths.verifyEmail,
    title: 'Confirm your e-mail address',
    access: 'anyone',
    page: () => import('../features/account/components/verify-email-page').then((m) => m.VerifyEmailPage),
  },
  {
    path: paths.resetPassword,
    title: 'Reset password',
    access: 'anyone',
    page: () => import('../features/account/components/reset-password-page').then((m) => m.ResetPasswordPage),
  },
  {
    path: paths.unsubscribe,
    title: 'Stop these e-mails',
    access: 'anyone',
    page: () => import('../features/account/components/unsubscribe-page').then((m) => m.UnsubscribePage),
  },
  {
    path: paths.emailSettings,
    title: 'E-mail settings',
    access: 'signed-in',
    page: () => import('../features/account/components/email-settings-page').then((m) => m.EmailSettingsPage),
  },
  {
    path: paths.outbox,
    title: 'Outbox',
    access: ['admin'],
    page: () => import('../features/admin-outbox/components/outbox-page').then((m) => m.OutboxPage),
    menu: { icon: EnvelopeIcon, order: 45 },
  },
];
