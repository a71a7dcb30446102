/**
 * Class sessions: a signed-in teacher puts one of the lab's experiments in front of a class;
 * students join from their phones with a join code and a nickname (no account) and answer the
 * current prediction question. Everything lives in the database (several app servers may share
 * it) and nothing outlives the session: ending it, or its time running out, deletes the session
 * with every seat and answer.
 */
import { error } from '@sveltejs/kit';
import { and, asc, count, eq, lt } from 'drizzle-orm';
import { createHash, randomBytes, randomInt } from 'node:crypto';
import { requireActor, type Actor } from './access';
import { getDb } from './db';
import { classAnswers, classSeats, classSessions } from './db/tables';
import { EXPERIMENTS, answerTo, type Experiment } from '$lib/lab/experiments';
import { JOIN_CODE_ALPHABET, JOIN_CODE_LENGTH } from '$lib/schemas/class-session';

/** How long a session lasts from its start: a double lesson (common practice, no source). */
export const SESSION_MINUTES = 120;
/** Sessions one teacher may have open at once. */
export const OPEN_SESSIONS_PER_HOST = 3;
/** Seats in one session: a large lecture, not a flood. */
const SEATS_PER_SESSION = 200;

type SessionRow = typeof classSessions.$inferSelect;

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

function newCode() {
	let code = '';
	for (let i = 0; i < JOIN_CODE_LENGTH; i++)
		code += JOIN_CODE_ALPHABET[randomInt(JOIN_CODE_ALPHABET.length)];
	return code;
}

function experimentOf(id: string): Experiment {
	const e = EXPERIMENTS.find((x) => x.id === id);
	if (!e) error(422, 'No such experiment in the lab.');
	return e;
}

/** Delete every session whose time has run out, with its seats and answers (by cascade). */
async function sweepClassSessions(now = new Date()) {
	await getDb().delete(classSessions).where(lt(classSessions.expiresAt, now));
}

/** What the class sees of a session: the step, its question, and the answer once revealed. */
function publicView(row: SessionRow) {
	const e = experimentOf(row.experimentId);
	const step = e.steps[row.step];
	const answer = row.revealed ? answerTo(e, row.step) : null;
	return {
		code: row.code,
		experiment: { id: e.id, title: e.title, steps: e.steps.length },
		step: row.step,
		say: step.say,
		question: step.ask
			? {
					text: step.ask.question,
					choices: step.ask.choices.map((c) => ({ id: c.id, label: c.label }))
				}
			: null,
		revealed: row.revealed,
		answer: answer
			? { choice: answer.choice.id, label: answer.choice.label, words: answer.words }
			: null,
		expiresAt: row.expiresAt
	};
}

export type ClassView = ReturnType<typeof publicView>;

async function hostedRow(actor: Actor | null, id: string) {
	const host = requireActor(actor);
	await sweepClassSessions();
	const [row] = await getDb()
		.select()
		.from(classSessions)
		.where(and(eq(classSessions.id, id), eq(classSessions.hostId, host.id)));
	// another teacher's session is not revealed to exist
	if (!row) error(404, 'No such class session, or it has ended.');
	return row;
}

/** The teacher's view: the class's view with every seat's answer to the current step. */
async function hostView(row: SessionRow) {
	const db = getDb();
	const answers = await db
		.select({
			nickname: classSeats.nickname,
			choice: classAnswers.choice,
			answeredAt: classAnswers.answeredAt
		})
		.from(classAnswers)
		.innerJoin(classSeats, eq(classSeats.id, classAnswers.seatId))
		.where(and(eq(classAnswers.sessionId, row.id), eq(classAnswers.step, row.step)))
		.orderBy(asc(classAnswers.answeredAt), asc(classSeats.nickname));
	const [{ seats }] = await db
		.select({ seats: count() })
		.from(classSeats)
		.where(eq(classSeats.sessionId, row.id));
	const view = publicView(row);
	const tally = (id: string) => answers.filter((a) => a.choice === id).length;
	return {
		id: row.id,
		...view,
		question: view.question && {
			...view.question,
			choices: view.question.choices.map((c) => ({ ...c, count: tally(c.id) }))
		},
		seats,
		answers
	};
}

export type HostView = Awaited<ReturnType<typeof hostView>>;

/** Start a session on an experiment's step; any signed-in person may teach. */
export async function startClassSession(
	actor: Actor | null,
	input: { experiment: string; step: number }
): Promise<HostView> {
	const host = requireActor(actor);
	const e = experimentOf(input.experiment);
	if (input.step >= e.steps.length) error(422, `This experiment has ${e.steps.length} steps.`);
	await sweepClassSessions();
	const db = getDb();
	const [{ open }] = await db
		.select({ open: count() })
		.from(classSessions)
		.where(eq(classSessions.hostId, host.id));
	if (open >= OPEN_SESSIONS_PER_HOST)
		error(409, `You have ${open} sessions open already. End one before starting another.`);
	const expiresAt = new Date(Date.now() + SESSION_MINUTES * 60_000);
	for (let attempt = 0; attempt < 8; attempt++) {
		const code = newCode();
		const [taken] = await db
			.select({ id: classSessions.id })
			.from(classSessions)
			.where(eq(classSessions.code, code));
		if (taken) continue;
		const [row] = await db
			.insert(classSessions)
			.values({ code, hostId: host.id, experimentId: e.id, step: input.step, expiresAt })
			.returning();
		return hostView(row);
	}
	throw new Error('no free join code after 8 tries');
}

/** The teacher's sessions still open, newest first. */
export async function listClassSessions(actor: Actor | null) {
	const host = requireActor(actor);
	await sweepClassSessions();
	const rows = await getDb()
		.select()
		.from(classSessions)
		.where(eq(classSessions.hostId, host.id))
		.orderBy(asc(classSessions.createdAt));
	return rows.map((r) => ({ id: r.id, ...publicView(r) })).reverse();
}

export async function getClassSession(actor: Actor | null, id: string): Promise<HostView> {
	return hostView(await hostedRow(actor, id));
}

/** Move to a step (its answer hidden again) or show the current step's answer. */
export async function updateClassSession(
	actor: Actor | null,
	id: string,
	change: { step?: number; revealed?: boolean }
): Promise<HostView> {
	const row = await hostedRow(actor, id);
	const e = experimentOf(row.experimentId);
	const step = change.step ?? row.step;
	if (step >= e.steps.length) error(422, `This experiment has ${e.steps.length} steps.`);
	const revealed = change.revealed ?? (step === row.step ? row.revealed : false);
	if (revealed && !e.steps[step].ask) error(409, 'This step asks no question.');
	const [next] = await getDb()
		.update(classSessions)
		.set({ step, revealed })
		.where(eq(classSessions.id, row.id))
		.returning();
	return hostView(next);
}

/** End a session now: it is deleted with every nickname and answer. */
export async function endClassSession(actor: Actor | null, id: string) {
	const row = await hostedRow(actor, id);
	await getDb().delete(classSessions).where(eq(classSessions.id, row.id));
}

// ---- the class's side: no account, a join code, a nickname and a seat token ----

/** The open session a join code names, or null (unknown, ended or past its time). */
async function byCode(code: string) {
	const [row] = await getDb().select().from(classSessions).where(eq(classSessions.code, code));
	if (!row) return null;
	if (row.expiresAt.getTime() <= Date.now()) {
		await sweepClassSessions();
		return null;
	}
	return row;
}

/** What a student's phone shows: null when the code names no open session. */
export async function classByCode(code: string): Promise<ClassView | null> {
	const row = await byCode(code);
	return row && publicView(row);
}

/** Take a seat with a nickname; the seat token is returned once and only its hash is kept. */
export async function joinClass(code: string, nickname: string) {
	const row = await byCode(code);
	if (!row) error(404, 'No open session has that code. Check it on the teacher’s screen.');
	const db = getDb();
	const [{ seats }] = await db
		.select({ seats: count() })
		.from(classSeats)
		.where(eq(classSeats.sessionId, row.id));
	if (seats >= SEATS_PER_SESSION) error(409, 'This session is full.');
	const nicknameKey = nickname.toLocaleLowerCase('en');
	const [same] = await db
		.select({ id: classSeats.id })
		.from(classSeats)
		.where(and(eq(classSeats.sessionId, row.id), eq(classSeats.nicknameKey, nicknameKey)));
	if (same) error(409, `Someone here is already called ${nickname}. Choose another nickname.`);
	const seat = randomBytes(24).toString('base64url');
	try {
		await db
			.insert(classSeats)
			.values({ sessionId: row.id, nickname, nicknameKey, tokenHash: sha256(seat) });
	} catch {
		// two phones sent the same nickname at once: the unique index kept one
		error(409, `Someone here is already called ${nickname}. Choose another nickname.`);
	}
	return { seat, nickname, session: publicView(row) };
}

/** Answer the current step's question (again, until the answer is revealed). */
export async function answerClass(code: string, input: { seat: string; choice: string }) {
	const row = await byCode(code);
	if (!row) error(404, 'No open session has that code. It may have ended.');
	const db = getDb();
	const [seat] = await db
		.select({ id: classSeats.id, nickname: classSeats.nickname })
		.from(classSeats)
		.where(and(eq(classSeats.sessionId, row.id), eq(classSeats.tokenHash, sha256(input.seat))));
	if (!seat) error(403, 'Join the session first.');
	const ask = experimentOf(row.experimentId).steps[row.step].ask;
	if (!ask) error(409, 'There is no question to answer just now. Watch the teacher’s screen.');
	if (row.revealed) error(409, 'The answer has been shown; wait for the next question.');
	if (!ask.choices.some((c) => c.id === input.choice))
		error(422, 'Choose one of the answers on the screen.');
	const answeredAt = new Date();
	await db
		.insert(classAnswers)
		.values({
			seatId: seat.id,
			sessionId: row.id,
			step: row.step,
			choice: input.choice,
			answeredAt
		})
		.onConflictDoUpdate({
			target: [classAnswers.seatId, classAnswers.step],
			set: { choice: input.choice, answeredAt }
		});
	return { nickname: seat.nickname, step: row.step, choice: input.choice, answeredAt };
}
