import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeUser, makeWorkshopWithCast } from './support/actors';
import * as ws from '../../src/lib/server/workshops';

useTempDb();

const statusOf = async (fn: () => Promise<unknown>) => {
	try {
		await fn();
		return 'ok';
	} catch (e) {
		return (e as { status?: number }).status ?? 'threw';
	}
};

describe('workshops, members and invitations', () => {
	it('an invitation joins the invited address with its role, once', async () => {
		const cast = await makeWorkshopWithCast();
		const guest = await makeUser('guest');
		const { token } = await ws.createInvitation(
			cast.owner,
			cast.workshopId,
			guest.email.toUpperCase(),
			'viewer'
		);
		expect((await ws.findInvitation(token)).state).toBe('open');
		// someone else holding the link cannot take the place
		expect(await statusOf(async () => await ws.acceptInvitation(cast.outsider, token))).toBe(403);
		await ws.acceptInvitation(guest, token);
		expect((await ws.listWorkshops(guest)).find((w) => w.id === cast.workshopId)?.role).toBe(
			'viewer'
		);
		expect((await ws.currentWorkshop(guest))?.id).toBe(cast.workshopId);
		expect(await statusOf(async () => await ws.acceptInvitation(guest, token))).toBe(410);
		expect((await ws.findInvitation('not-a-token')).state).toBe('unknown');
	});

	it('only owners invite, rename and manage members', async () => {
		const cast = await makeWorkshopWithCast();
		expect(
			await statusOf(
				async () =>
					await ws.createInvitation(cast.editor, cast.workshopId, 'a@example.test', 'viewer')
			)
		).toBe(403);
		expect(
			await statusOf(async () => await ws.renameWorkshop(cast.viewer, cast.workshopId, 'Mine now'))
		).toBe(403);
		expect(
			await statusOf(
				async () => await ws.changeMemberRole(cast.editor, cast.workshopId, cast.viewer.id, 'owner')
			)
		).toBe(403);
		expect(await statusOf(async () => await ws.listMembers(cast.outsider, cast.workshopId))).toBe(
			404
		);
		await ws.changeMemberRole(cast.owner, cast.workshopId, cast.viewer.id, 'editor');
		expect((await ws.membershipOf(cast.viewer.id, cast.workshopId))?.role).toBe('editor');
	});

	it('keeps at least one owner', async () => {
		const cast = await makeWorkshopWithCast();
		expect(
			await statusOf(
				async () => await ws.changeMemberRole(cast.owner, cast.workshopId, cast.owner.id, 'editor')
			)
		).toBe(409);
		expect(
			await statusOf(async () => await ws.removeMember(cast.owner, cast.workshopId, cast.owner.id))
		).toBe(409);
		await ws.changeMemberRole(cast.owner, cast.workshopId, cast.editor.id, 'owner');
		expect(
			(await ws.listMembers(cast.owner, cast.workshopId)).filter((m) => m.role === 'owner')
		).toHaveLength(2);
		await ws.changeMemberRole(cast.owner, cast.workshopId, cast.owner.id, 'viewer');
		expect((await ws.membershipOf(cast.owner.id, cast.workshopId))?.role).toBe('viewer');
	});

	it('a member may switch between their workshops, not into others', async () => {
		const cast = await makeWorkshopWithCast();
		const second = await ws.createWorkshopFor(cast.viewer.id, 'Evening class');
		expect((await ws.currentWorkshop(cast.viewer))?.id).toBe(second.id);
		await ws.switchWorkshop(cast.viewer, cast.workshopId);
		expect((await ws.currentWorkshop(cast.viewer))?.id).toBe(cast.workshopId);
		expect(
			await statusOf(async () => await ws.switchWorkshop(cast.outsider, cast.workshopId))
		).toBe(404);
	});
});

describe('accepting an invitation as an existing member', () => {
	it('applies the role the owner chose, and says it changed', async () => {
		const cast = await makeWorkshopWithCast();
		const { token } = await ws.createInvitation(
			cast.owner,
			cast.workshopId,
			cast.viewer.email,
			'editor'
		);
		const { outcome } = await ws.acceptInvitation(cast.viewer, token);
		expect(outcome).toEqual({ kind: 'role-changed', from: 'viewer', role: 'editor' });
		expect((await ws.membershipOf(cast.viewer.id, cast.workshopId))?.role).toBe('editor');
	});

	it('never demotes the last owner, and says so', async () => {
		const cast = await makeWorkshopWithCast();
		const { token } = await ws.createInvitation(
			cast.owner,
			cast.workshopId,
			cast.owner.email,
			'viewer'
		);
		const { outcome } = await ws.acceptInvitation(cast.owner, token);
		expect(outcome).toEqual({ kind: 'kept-last-owner', role: 'owner', invited: 'viewer' });
		expect((await ws.membershipOf(cast.owner.id, cast.workshopId))?.role).toBe('owner');
	});

	it('a newcomer joins with the invited role', async () => {
		const cast = await makeWorkshopWithCast();
		const newcomer = await makeUser('newcomer');
		const { token } = await ws.createInvitation(
			cast.owner,
			cast.workshopId,
			newcomer.email,
			'viewer'
		);
		expect((await ws.acceptInvitation(newcomer, token)).outcome).toEqual({
			kind: 'joined',
			role: 'viewer'
		});
	});
});
