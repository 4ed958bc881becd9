/** The team page: members with their roles, and (for admins) pending invitations. Role changes are optimistic. */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { teamApi } from '@/api/team';
import { errorMessage } from '@/api/errors';
import type { PendingInvitation, TeamMember, TeamRole } from '@shared/api/account.ts';
import { useSessionStore } from '@/stores/session';

export const useTeamStore = defineStore('team', () => {
  const teamName = ref('');
  const members = ref<TeamMember[]>([]);
  const invitations = ref<PendingInvitation[]>([]);
  const error = ref<string | null>(null);

  async function load(): Promise<void> {
    try {
      const team = await teamApi.team();
      teamName.value = team.team.name;
      members.value = team.members;
      if (useSessionStore().isAdmin) invitations.value = await teamApi.invitations();
    } catch (err) {
      error.value = errorMessage(err);
    }
  }

  /** Shows the new role at once and puts the old one back when the server refuses (then rethrows). */
  async function setRole(m: TeamMember, role: TeamRole): Promise<void> {
    const before = m.role;
    m.role = role;
    try {
      await teamApi.setRole(m.id, role);
    } catch (err) {
      m.role = before;
      throw err;
    }
  }

  async function remove(m: TeamMember): Promise<void> {
    await teamApi.removeMember(m.id);
    members.value = members.value.filter((x) => x.id !== m.id);
  }

  async function revoke(inv: PendingInvitation): Promise<void> {
    await teamApi.revokeInvitation(inv.id);
    invitations.value = invitations.value.filter((x) => x.id !== inv.id);
  }

  const invite = (email: string, role: TeamRole) => teamApi.invite(email, role);

  return { teamName, members, invitations, error, load, setRole, remove, revoke, invite };
});
