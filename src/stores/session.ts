/** The signed-in member: who they are, their team and role. Hydrated once by the router guard. */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { accountApi } from '@/api/account';
import { authApi, resetCsrfToken } from '@/api/auth';
import { errorStatus } from '@/api/errors';

import type { Me, TeamRole } from '@shared/api/account.ts';

export type { Me, TeamRole } from '@shared/api/account.ts';

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
      me.value = await authApi.me();
    } catch (err) {
      if (errorStatus(err) !== 401) throw err;
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
    const next = await authApi.login(email, password);
    adopt(next);
    return next;
  }

  async function signOut(): Promise<void> {
    try {
      await authApi.logout();
    } finally {
      dehydrate();
    }
  }

  /** Accepting an invitation signs the new member in. */
  async function acceptInvitation(token: string, name: string, password: string): Promise<void> {
    adopt(await authApi.acceptInvitation(token, { name, password }));
  }

  async function saveName(name: string): Promise<void> {
    me.value = await accountApi.saveProfile(name);
  }

  return {
    me, hydrated, signedIn, role, isAdmin, hydrate, dehydrate, adopt, signIn, signOut, acceptInvitation, saveName,
    changePassword: accountApi.changePassword,
    requestPasswordReset: async (email: string) => (await authApi.requestPasswordReset(email)).message,
    passwordResetEmail: async (token: string) => (await authApi.passwordResetEmail(token)).email,
    resetPassword: authApi.resetPassword,
    invitation: authApi.invitation,
  };
});
