import type { Actor } from './access';
import { mailDown, sendMail } from './mail';

/**
 * The invitation e-mail: who invites, to which workshop, with which role, and the one-time link.
 * Resolves to false when the mail server cannot be reached (the page says so).
 */
export async function sendInvitation(args: {
	to: string;
	from: Actor;
	workshopName: string;
	role: string;
	link: string;
}) {
	const who = args.from.name ?? args.from.email;
	const can =
		args.role === 'viewer'
			? 'read its projects and records'
			: args.role === 'editor'
				? 'create and change its projects and analyses'
				: 'manage it, its members and its projects';
	const text = `${who} invites you to the workshop "${args.workshopName}" on Spanwright as ${args.role}: you will be able to ${can}.\n\nAccept the invitation:\n${args.link}\n\nThe link works once and expires in 7 days. If you did not expect this, ignore this message.`;
	const sent = await sendMail({
		to: args.to,
		subject: `${who} invites you to ${args.workshopName} on Spanwright`,
		text,
		html: `<p>${escapeHtml(who)} invites you to the workshop <strong>${escapeHtml(args.workshopName)}</strong> on Spanwright as <strong>${args.role}</strong>: you will be able to ${can}.</p><p><a href="${args.link}">Accept the invitation</a></p><p>The link works once and expires in 7 days.</p>`
	}).then(() => true, mailDown);
	return sent === true;
}

/** The invitation to read one project (a client or an installer), with its one-time link. */
export async function sendProjectInvitation(args: {
	to: string;
	from: Actor;
	projectName: string;
	link: string;
}) {
	const who = args.from.name ?? args.from.email;
	const text = `${who} invites you to read the project "${args.projectName}" on Spanwright: its records, drawings and cautions. You will see this project only.\n\nAccept the invitation:\n${args.link}\n\nThe link works once and expires in 7 days. If you did not expect this, ignore this message.`;
	const sent = await sendMail({
		to: args.to,
		subject: `${who} shares the project ${args.projectName} with you on Spanwright`,
		text,
		html: `<p>${escapeHtml(who)} invites you to read the project <strong>${escapeHtml(args.projectName)}</strong> on Spanwright: its records, drawings and cautions. You will see this project only.</p><p><a href="${args.link}">Accept the invitation</a></p><p>The link works once and expires in 7 days.</p>`
	}).then(() => true, mailDown);
	return sent === true;
}

function escapeHtml(s: string) {
	return s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
