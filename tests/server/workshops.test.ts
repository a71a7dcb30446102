import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeUser, makeWorkshopWithCast } from './support/actors';
import * as ws from '../../src/lib/server/workshops';

useTempDb();

const statusOf = (fn: () => unknown) => {
	try {
		fn();
		return 'ok';
	} catch (e) {
		return (e as { status?: number }).status ?? 'threw';
	}
};

describe('workshops, members and invitations', () => {
	it('an invitation joins the invited address with its role, once', () => {
		const cast = makeWorkshopWithCast();
		const guest = makeUser('guest');
		const { token } = ws.createInvitation(
			cast.owner,
			cast.workshopId,
			guest.email.toUpperCase(),
			'viewer'
		);
		expect(ws.findInvitation(token).state).toBe('open');
		// someone else holding the link cannot take the place
		expect(statusOf(() => ws.acceptInvitation(cast.outsider, token))).toBe(403);
		ws.acceptInvitation(guest, token);
		expect(ws.listWorkshops(guest).find((w) => w.id === cast.workshopId)?.role).toBe('viewer');
		expect(ws.currentWorkshop(guest)?.id).toBe(cast.workshopId);
		expect(statusOf(() => ws.acceptInvitation(guest, token))).toBe(410);
		expect(ws.findInvitation('not-a-token').state).toBe('unknown');
	});

	it('only owners invite, rename and manage members', () => {
		const cast = makeWorkshopWithCast();
		expect(
			statusOf(() => ws.createInvitation(cast.editor, cast.workshopId, 'a@example.test', 'viewer'))
		).toBe(403);
		expect(statusOf(() => ws.renameWorkshop(cast.viewer, cast.workshopId, 'Mine now'))).toBe(403);
		expect(
			statusOf(() => ws.changeMemberRole(cast.editor, cast.workshopId, cast.viewer.id, 'owner'))
		).toBe(403);
		expect(statusOf(() => ws.listMembers(cast.outsider, cast.workshopId))).toBe(404);
		ws.changeMemberRole(cast.owner, cast.workshopId, cast.viewer.id, 'editor');
		expect(ws.membershipOf(cast.viewer.id, cast.workshopId)?.role).toBe('editor');
	});

	it('keeps at least one owner', () => {
		const cast = makeWorkshopWithCast();
		expect(
			statusOf(() => ws.changeMemberRole(cast.owner, cast.workshopId, cast.owner.id, 'editor'))
		).toBe(409);
		expect(statusOf(() => ws.removeMember(cast.owner, cast.workshopId, cast.owner.id))).toBe(409);
		ws.changeMemberRole(cast.owner, cast.workshopId, cast.editor.id, 'owner');
		expect(
			ws.listMembers(cast.owner, cast.workshopId).filter((m) => m.role === 'owner')
		).toHaveLength(2);
		ws.changeMemberRole(cast.owner, cast.workshopId, cast.owner.id, 'viewer');
		expect(ws.membershipOf(cast.owner.id, cast.workshopId)?.role).toBe('viewer');
	});

	it('a member may switch between their workshops, not into others', () => {
		const cast = makeWorkshopWithCast();
		const second = ws.createWorkshopFor(cast.viewer.id, 'Evening class');
		expect(ws.currentWorkshop(cast.viewer)?.id).toBe(second.id);
		ws.switchWorkshop(cast.viewer, cast.workshopId);
		expect(ws.currentWorkshop(cast.viewer)?.id).toBe(cast.workshopId);
		expect(statusOf(() => ws.switchWorkshop(cast.outsider, cast.workshopId))).toBe(404);
	});
});

describe('accepting an invitation as an existing member', () => {
	it('applies the role the owner chose, and says it changed', () => {
		const cast = makeWorkshopWithCast();
		const { token } = ws.createInvitation(cast.owner, cast.workshopId, cast.viewer.email, 'editor');
		const { outcome } = ws.acceptInvitation(cast.viewer, token);
		expect(outcome).toEqual({ kind: 'role-changed', from: 'viewer', role: 'editor' });
		expect(ws.membershipOf(cast.viewer.id, cast.workshopId)?.role).toBe('editor');
	});

	it('never demotes the last owner, and says so', () => {
		const cast = makeWorkshopWithCast();
		const { token } = ws.createInvitation(cast.owner, cast.workshopId, cast.owner.email, 'viewer');
		const { outcome } = ws.acceptInvitation(cast.owner, token);
		expect(outcome).toEqual({ kind: 'kept-last-owner', role: 'owner', invited: 'viewer' });
		expect(ws.membershipOf(cast.owner.id, cast.workshopId)?.role).toBe('owner');
	});

	it('a newcomer joins with the invited role', () => {
		const cast = makeWorkshopWithCast();
		const newcomer = makeUser('newcomer');
		const { token } = ws.createInvitation(cast.owner, cast.workshopId, newcomer.email, 'viewer');
		expect(ws.acceptInvitation(newcomer, token).outcome).toEqual({
			kind: 'joined',
			role: 'viewer'
		});
	});
});
