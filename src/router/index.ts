import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router';
import SignedOutLayout from '@/layouts/SignedOutLayout.vue';
import { useSessionStore } from '@/stores/session';

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without signing in. */
    public?: boolean;
    /** Only team admins; others are sent home. */
    adminOnly?: boolean;
    title?: string;
  }
}

export const routes: RouteRecordRaw[] = [
  // Every page is lazy, the signed-in layout too, so the sign-in page loads none of the app's tables and menus.
  {
    path: '/',
    component: () => import('@/layouts/AppLayout.vue'),
    children: [
      { path: '', name: 'home', component: () => import('@/views/HomeView.vue'), meta: { title: 'Studies' } },
      { path: 'account', name: 'account', component: () => import('@/views/AccountView.vue'), meta: { title: 'Account' } },
      { path: 'team', name: 'team', component: () => import('@/views/TeamView.vue'), meta: { title: 'Team' } },
      { path: 'outbox', name: 'outbox', component: () => import('@/views/OutboxView.vue'), meta: { title: 'Outbox' } },
      { path: 'studies/:id', name: 'study', component: () => import('@/views/StudyView.vue'), meta: { title: 'Study' } },
    ],
  },
  // Lazy routes below: each view is its own chunk. Signed-out pages go under SignedOutLayout.
  {
    path: '/',
    component: SignedOutLayout,
    children: [
      { path: 'sign-in', name: 'sign-in', component: () => import('@/views/SignInView.vue'), meta: { public: true, title: 'Sign in' } },
      { path: 'forgot-password', name: 'forgot-password', component: () => import('@/views/ForgotPasswordView.vue'), meta: { public: true, title: 'Forgot password' } },
      { path: 'reset/:token', name: 'reset-password', component: () => import('@/views/ResetPasswordView.vue'), meta: { public: true, title: 'New password' } },
      { path: 'invite/:token', name: 'accept-invite', component: () => import('@/views/AcceptInviteView.vue'), meta: { public: true, title: 'Join your team' } },
    ],
  },
  // Lazy, and outside the app layout so the printed review packet carries no app chrome.
  { path: '/studies/:id/packet', name: 'study-packet', component: () => import('@/views/PacketView.vue'), meta: { title: 'Review packet' } },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('@/views/NotFoundView.vue'),
    meta: { public: true, title: 'Not found' },
  },
];

export const router = createRouter({ history: createWebHistory(import.meta.env.BASE_URL), routes });

/** Signed-out visitors of a non-public page go to sign-in and come back afterwards. */
router.beforeEach(async (to) => {
  const session = useSessionStore();
  if (!session.hydrated) await session.hydrate().catch(() => undefined);
  if (to.meta.public) return true;
  if (!session.signedIn) return { name: 'sign-in', query: { next: to.fullPath } };
  if (to.meta.adminOnly && !session.isAdmin) return { name: 'home' };
  return true;
});

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Lobewise` : 'Lobewise';
});
