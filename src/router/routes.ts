// The app's routes: named, lazy-loaded (except the landing page), guarded by meta.roles. The drill
// pages come from the drill registry. Component tests mount pages through these same routes.
import type { RouteComponent, RouteMeta, RouteRecordRaw } from 'vue-router'
import type { Role } from '../contract/users'
import { drillRouteName } from '../drills/drill-definition'
import { DRILL_LIST } from '../drills/registry'
import LandingView from '../views/LandingView.vue'

type Lazy = () => Promise<RouteComponent | { default: RouteComponent }>

const ANY_USER: Role[] = ['student', 'teacher', 'admin']
const page = (path: string, name: string, component: Lazy, meta: RouteMeta): RouteRecordRaw => ({
  path,
  name,
  component,
  meta,
})
/** A page anyone may open, in the public frame. */
const open = (path: string, name: string, component: Lazy, title: string) =>
  page(path, name, component, { layout: 'public', title })
/** A page for signed-in users of these roles. */
const signedIn = (path: string, name: string, component: Lazy, title: string, roles = ANY_USER) =>
  page(path, name, component, { roles: [...roles], title })

export const routes: RouteRecordRaw[] = [
  {
    path: '/',
    name: 'landing',
    component: LandingView,
    meta: { layout: 'public', title: 'Welcome' },
  },
  open('/sign-in', 'sign-in', () => import('../views/SignInView.vue'), 'Sign in'),
  open('/register', 'register', () => import('../views/RegisterView.vue'), 'Create an account'),
  open(
    '/forgot-password',
    'forgot-password',
    () => import('../views/ForgotPasswordView.vue'),
    'Forgotten password',
  ),
  open(
    '/reset-password',
    'reset-password',
    () => import('../views/ResetPasswordView.vue'),
    'Choose a new password',
  ),
  open(
    '/shared/:token',
    'shared',
    () => import('../share/SharedExerciseView.vue'),
    'Shared exercise',
  ),
  signedIn('/practice', 'practice', () => import('../views/PracticeView.vue'), 'Practice'),
  ...DRILL_LIST.map((drill) =>
    page(drill.route, drillRouteName(drill.id), drill.page, {
      ...{ roles: [...ANY_USER], title: drill.name },
      usesInstrument: true,
    }),
  ),
  signedIn('/tuner', 'tuner', () => import('../views/TunerView.vue'), 'Tuner'),
  signedIn(
    '/worksheets',
    'worksheets',
    () => import('../views/WorksheetsView.vue'),
    'Print & export',
  ),
  signedIn('/progress', 'progress', () => import('../views/ProgressView.vue'), 'Progress'),
  signedIn('/studio', 'studio', () => import('../views/StudioView.vue'), 'Studio', ['teacher']),
  signedIn(
    '/studio/plans',
    'studio-plans',
    () => import('../views/PlansView.vue'),
    'Practice plans',
    ['teacher'],
  ),
  signedIn(
    '/studio/students/:id',
    'studio-student',
    () => import('../views/StudioStudentView.vue'),
    'Student',
    ['teacher'],
  ),
  signedIn('/messages', 'messages', () => import('../views/MessagesView.vue'), 'Messages', [
    'teacher',
    'student',
  ]),
  signedIn('/recordings', 'recordings', () => import('../views/RecordingsView.vue'), 'Recordings', [
    'student',
    'teacher',
  ]),
  signedIn('/plans', 'my-plans', () => import('../views/MyPlansView.vue'), 'My plans', ['student']),
  open(
    '/invitations/accept',
    'invitation-accept',
    () => import('../views/InvitationAcceptView.vue'),
    'Join a studio',
  ),
  { path: '/admin', redirect: { name: 'admin-users' } },
  signedIn('/admin/users', 'admin-users', () => import('../views/AdminUsersView.vue'), 'Users', [
    'admin',
  ]),
  signedIn('/admin/mail', 'admin-mail', () => import('../views/AdminMailView.vue'), 'Mail log', [
    'admin',
  ]),
  signedIn(
    '/instruments',
    'instruments',
    () => import('../views/InstrumentsView.vue'),
    'Instruments',
  ),
  signedIn('/billing', 'billing', () => import('../views/BillingView.vue'), 'Billing'),
  signedIn('/account', 'account', () => import('../views/AccountView.vue'), 'Account'),
  open('/:pathMatch(.*)*', 'not-found', () => import('../views/NotFoundView.vue'), 'Not found'),
]
