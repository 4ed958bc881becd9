/** The signed-in member's API tokens; the plain token is only in the answer to creating one. */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { accountApi } from '@/api/account';
import type { ApiTokenRow } from '@shared/api/account.ts';

export const useApiTokensStore = defineStore('api-tokens', () => {
  const tokens = ref<ApiTokenRow[]>([]);

  async function load(): Promise<void> {
    tokens.value = await accountApi.tokens();
  }

  async function create(name: string): Promise<{ name: string; token: string }> {
    const made = await accountApi.createToken(name);
    await load();
    return { name: made.name, token: made.token };
  }

  async function revoke(t: ApiTokenRow): Promise<void> {
    await accountApi.deleteToken(t.id);
    tokens.value = tokens.value.filter((x) => x.id !== t.id);
  }

  return { tokens, load, create, revoke };
});
