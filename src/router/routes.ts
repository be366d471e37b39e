// The app's routes: named, lazy-loaded (except the landing page), guarded by meta.roles. The drill
// pages come from the drill registry. Component tests mount pages through these same routes.
import type { RouteRecordRaw } from 'vue-router'
import { drillRouteName } from '../drills/drill-definition'
import { DRILL_LIST } from '../drills/registry'
import LandingView from '../views/LandingView.vue'

const ANY_USER = ['student', 'teacher', 'admin'] as const

export const routes: RouteRecordRaw[] = [
  {
    path: '/',
    name: 'landing',
    component: LandingView,
    meta: { layout: 'public', title: 'Welcome' },
  },
  {
    path: '/sign-in',
    name: 'sign-in',
    component: () => import('../views/SignInView.vue'),
    meta: { layout: 'public', title: 'Sign in' },
  },
  {
    path: '/register',
    name: 'register',
    component: () => import('../views/RegisterView.vue'),
    meta: { layout: 'public', title: 'Create an account' },
  },
  {
    path: '/forgot-password',
    name: 'forgot-password',
    component: () => import('../views/ForgotPasswordView.vue'),
    meta: { layout: 'public', title: 'Forgotten password' },
  },
  {
    path: '/reset-password',
    name: 'reset-password',
    component: () => import('../views/ResetPasswordView.vue'),
    meta: { layout: 'public', title: 'Choose a new password' },
  },
  {
    path: '/practice',
    name: 'practice',
    component: () => import('../views/PracticeView.vue'),
    meta: { roles: [...ANY_USER], title: 'Practice' },
  },
  ...DRILL_LIST.map((drill): RouteRecordRaw => ({
    path: drill.route,
    name: drillRouteName(drill.id),
    component: drill.page,
    meta: { roles: [...ANY_USER], title: drill.name },
  })),
  {
    path: '/progress',
    name: 'progress',
    component: () => import('../views/ProgressView.vue'),
    meta: { roles: [...ANY_USER], title: 'Progress' },
  },
  {
    path: '/studio',
    name: 'studio',
    component: () => import('../views/StudioView.vue'),
    meta: { roles: ['teacher'], title: 'Studio' },
  },
  {
    path: '/studio/plans',
    name: 'studio-plans',
    component: () => import('../views/PlansView.vue'),
    meta: { roles: ['teacher'], title: 'Practice plans' },
  },
  {
    path: '/studio/students/:id',
    name: 'studio-student',
    component: () => import('../views/StudioStudentView.vue'),
    meta: { roles: ['teacher'], title: 'Student' },
  },
  {
    path: '/plans',
    name: 'my-plans',
    component: () => import('../views/MyPlansView.vue'),
    meta: { roles: ['student'], title: 'My plans' },
  },
  {
    path: '/invitations/accept',
    name: 'invitation-accept',
    component: () => import('../views/InvitationAcceptView.vue'),
    meta: { layout: 'public', title: 'Join a studio' },
  },
  { path: '/admin', redirect: { name: 'admin-users' } },
  {
    path: '/admin/users',
    name: 'admin-users',
    component: () => import('../views/AdminUsersView.vue'),
    meta: { roles: ['admin'], title: 'Users' },
  },
  {
    path: '/admin/mail',
    name: 'admin-mail',
    component: () => import('../views/AdminMailView.vue'),
    meta: { roles: ['admin'], title: 'Mail log' },
  },
  {
    path: '/instruments',
    name: 'instruments',
    component: () => import('../views/InstrumentsView.vue'),
    meta: { roles: [...ANY_USER], title: 'Instruments' },
  },
  {
    path: '/account',
    name: 'account',
    component: () => import('../views/AccountView.vue'),
    meta: { roles: [...ANY_USER], title: 'Account' },
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('../views/NotFoundView.vue'),
    meta: { layout: 'public', title: 'Not found' },
  },
]
