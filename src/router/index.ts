import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router';
import AppLayout from '@/layouts/AppLayout.vue';
import HomeView from '@/views/HomeView.vue';

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without signing in. */
    public?: boolean;
    title?: string;
  }
}

export const routes: RouteRecordRaw[] = [
  {
    path: '/',
    component: AppLayout,
    children: [{ path: '', name: 'home', component: HomeView, meta: { title: 'Studies' } }],
  },
  // Lazy routes below: each view is its own chunk. Signed-out pages go under SignedOutLayout.
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('@/views/NotFoundView.vue'),
    meta: { public: true, title: 'Not found' },
  },
];

export const router = createRouter({ history: createWebHistory(import.meta.env.BASE_URL), routes });

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Lobewise` : 'Lobewise';
});
