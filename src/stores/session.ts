/** The signed-in member: who they are, their team and role. Hydrated once by the router guard. */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { api, ApiRequestError, resetCsrfToken } from '@/api/client';

export type TeamRole = 'admin' | 'engineer' | 'reviewer';

export interface Me {
  user: { id: string; email: string; name: string; role: TeamRole };
  team: { id: string; name: string };
}

/** Same rule as the server (server/auth/password.ts); the server has the last word. */
export const PASSWORD_MIN_LENGTH = 10;

export const useSessionStore = defineStore('session', () => {
  const me = ref<Me | null>(null);
  const hydrated = ref(false);

  const signedIn = computed(() => me.value !== null);
  const role = computed<TeamRole | null>(() => me.value?.user.role ?? null);
  const isAdmin = computed(() => role.value === 'admin');

  /** Asks the server who we are; a 401 simply means signed out. */
  async function hydrate(): Promise<void> {
    try {
      me.value = await api.get<Me>('/api/me');
    } catch (err) {
      if (!(err instanceof ApiRequestError && err.status === 401)) throw err;
      me.value = null;
    } finally {
      hydrated.value = true;
    }
  }

  /** Forgets everything session-scoped (the CSRF token belonged to the old session). */
  function dehydrate(): void {
    me.value = null;
    resetCsrfToken();
  }

  /** After sign-in or accepting an invitation the server answers with the new identity. */
  function adopt(next: Me): void {
    me.value = next;
    hydrated.value = true;
    // The session id was rotated; the old CSRF token no longer matches it.
    resetCsrfToken();
  }

  async function signIn(email: string, password: string): Promise<Me> {
    const next = await api.post<Me>('/api/auth/login', { email, password });
    adopt(next);
    return next;
  }

  async function signOut(): Promise<void> {
    try {
      await api.post('/api/auth/logout');
    } finally {
      dehydrate();
    }
  }

  return { me, hydrated, signedIn, role, isAdmin, hydrate, dehydrate, adopt, signIn, signOut };
});
