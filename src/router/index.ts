// Routes: named, lazy-loaded (except the landing page), guarded by meta.roles.
import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router'
import { setUnauthorizedHandler } from '../api/http'
import { useAuthStore } from '../stores/auth'
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
  {
    path: '/practice/recall',
    name: 'practice-recall',
    component: () => import('../views/NeckRecallView.vue'),
    meta: { roles: [...ANY_USER], title: 'Neck Recall' },
  },
  {
    path: '/practice/hunt',
    name: 'practice-hunt',
    component: () => import('../views/PitchHuntView.vue'),
    meta: { roles: [...ANY_USER], title: 'Pitch Hunt' },
  },
  {
    path: '/practice/runs',
    name: 'practice-runs',
    component: () => import('../views/RangeRunsView.vue'),
    meta: { roles: [...ANY_USER], title: 'Range Runs' },
  },
  {
    path: '/practice/scatter',
    name: 'practice-scatter',
    component: () => import('../views/OctaveScatterView.vue'),
    meta: { roles: [...ANY_USER], title: 'Octave Scatter' },
  },
  {
    path: '/practice/cycle',
    name: 'practice-cycle',
    component: () => import('../views/WindowCycleView.vue'),
    meta: { roles: [...ANY_USER], title: 'Window Cycle' },
  },
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
    path: '/worksheets',
    name: 'worksheets',
    component: () => import('../views/WorksheetsView.vue'),
    meta: { roles: [...ANY_USER], title: 'Print & export' },
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

const router = createRouter({ history: createWebHistory(), routes })

router.beforeEach(async (to) => {
  const auth = useAuthStore()
  await auth.loadSession().catch(() => undefined)
  if (!to.meta.roles) return true
  if (!auth.isSignedIn) return { name: 'sign-in', query: { next: to.fullPath } }
  if (!auth.hasRole(to.meta.roles)) return { name: auth.homeRoute }
  return true
})

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Ambitus` : 'Ambitus'
})

// One place handles a 401: forget the user, go to sign-in, then come back.
setUnauthorizedHandler(() => {
  const auth = useAuthStore()
  auth.expire()
  const current = router.currentRoute.value
  if (current.meta.roles) void router.push({ name: 'sign-in', query: { next: current.fullPath } })
})

export default router
