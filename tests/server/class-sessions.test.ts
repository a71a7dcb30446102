// Class sessions: a teacher's question to a class, answered from phones without accounts. The
// session, its seats and answers live only in the database and are gone once it ends or expires.
import { count, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { event, makeUser } from './support/actors';
import { getDb } from '../../src/lib/server/db';
import { classAnswers, classSeats, classSessions } from '../../src/lib/server/db/tables';
import {
	OPEN_SESSIONS_PER_HOST,
	SESSION_MINUTES,
	answerClass,
	classByCode,
	endClassSession,
	getClassSession,
	joinClass,
	startClassSession,
	updateClassSession
} from '../../src/lib/server/class-sessions';
import { CLASS_JOIN_BUDGET, CLASS_MISS_BUDGET } from '../../src/lib/server/class-limits';
import { EXPERIMENTS, answerTo } from '../../src/lib/lab/experiments';
import { joinCodeSchema, nicknameSchema } from '../../src/lib/schemas/class-session';
import * as classApi from '../../src/routes/api/v1/class/[code]/+server';
import * as seatsApi from '../../src/routes/api/v1/class/[code]/seats/+server';
import * as answerApi from '../../src/routes/api/v1/class/[code]/answer/+server';

useTempDb();

const span = EXPERIMENTS.find((e) => e.id === 'span')!;

async function status(p: Promise<unknown>) {
	try {
		await p;
		return 200;
	} catch (e) {
		return (e as { status?: number }).status ?? 500;
	}
}

async function rows(sessionId: string) {
	const db = getDb();
	const [s] = await db
		.select({ n: count() })
		.from(classSessions)
		.where(eq(classSessions.id, sessionId));
	const [seats] = await db
		.select({ n: count() })
		.from(classSeats)
		.where(eq(classSeats.sessionId, sessionId));
	const [answers] = await db
		.select({ n: count() })
		.from(classAnswers)
		.where(eq(classAnswers.sessionId, sessionId));
	return { sessions: s.n, seats: seats.n, answers: answers.n };
}

describe('a class session from start to end', () => {
	it('takes two students’ answers, shows them to the teacher, reveals the engine’s answer, steps on and ends with nothing kept', async () => {
		const teacher = await makeUser('teacher');
		const started = await startClassSession(teacher, { experiment: 'span', step: 0 });
		expect(started.code).toMatch(/^[A-HJ-NP-Z2-9]{6}$/);
		const minutes = (started.expiresAt.getTime() - Date.now()) / 60_000;
		expect(minutes).toBeGreaterThan(SESSION_MINUTES - 1);
		expect(minutes).toBeLessThanOrEqual(SESSION_MINUTES);
		expect(started.question?.text).toBe(span.steps[0].ask!.question);
		expect(started.answer).toBeNull();

		const ana = await joinClass(started.code, 'Ana');
		const ben = await joinClass(started.code, 'Ben');
		expect(ana.seat).toMatch(/^[\w-]{32}$/);
		expect(await status(joinClass(started.code, 'ana'))).toBe(409); // the same name, any case
		// the phones see the question but not the answer
		const phone = await classByCode(started.code);
		expect(phone?.question?.choices.map((c) => c.id)).toEqual(['x2', 'x4', 'x8', 'x16']);
		expect(phone?.answer).toBeNull();

		await answerClass(started.code, { seat: ana.seat, choice: 'x2' });
		await answerClass(started.code, { seat: ben.seat, choice: 'x4' });
		await answerClass(started.code, { seat: ana.seat, choice: 'x16' }); // changed her mind
		expect(await status(answerClass(started.code, { seat: ben.seat, choice: 'x3' }))).toBe(422);
		let host = await getClassSession(teacher, started.id);
		expect(host.seats).toBe(2);
		expect(host.answers.map((a) => [a.nickname, a.choice]).sort()).toEqual([
			['Ana', 'x16'],
			['Ben', 'x4']
		]);
		expect(host.question?.choices.map((c) => c.count)).toEqual([0, 1, 0, 1]);
		expect(host.answer).toBeNull();

		// the answer comes from the engine: a uniform load on twice the span sags about 16 times
		// as much (deflection of a simply supported beam under uniform load goes as L⁴)
		host = await updateClassSession(teacher, started.id, { revealed: true });
		const engine = answerTo(span, 0)!;
		expect(engine.ratio).toBeGreaterThan(14);
		expect(engine.ratio).toBeLessThan(16.5);
		expect(host.answer).toEqual({ choice: 'x16', label: engine.choice.label, words: engine.words });
		expect((await classByCode(started.code))?.answer?.choice).toBe('x16');
		expect(await status(answerClass(started.code, { seat: ben.seat, choice: 'x16' }))).toBe(409);

		// stepping on hides the answer and starts an empty tally; a step without a question takes none
		host = await updateClassSession(teacher, started.id, { step: 1 });
		expect(host).toMatchObject({ step: 1, revealed: false, answer: null, question: null });
		expect(host.answers).toEqual([]);
		expect(await status(answerClass(started.code, { seat: ben.seat, choice: 'x4' }))).toBe(409);
		expect(await status(updateClassSession(teacher, started.id, { revealed: true }))).toBe(409);
		expect(await status(updateClassSession(teacher, started.id, { step: 9 }))).toBe(422);

		expect(await rows(started.id)).toEqual({ sessions: 1, seats: 2, answers: 2 });
		await endClassSession(teacher, started.id);
		expect(await rows(started.id)).toEqual({ sessions: 0, seats: 0, answers: 0 });
		expect(await classByCode(started.code)).toBeNull();
		expect(await status(joinClass(started.code, 'Cy'))).toBe(404);
	});

	it('deletes a session, its seats and answers once its time has passed', async () => {
		const teacher = await makeUser('teacher');
		const s = await startClassSession(teacher, { experiment: 'thickness', step: 0 });
		const { seat } = await joinClass(s.code, 'Dee');
		await answerClass(s.code, { seat, choice: 'd8' });
		await getDb()
			.update(classSessions)
			.set({ expiresAt: new Date(Date.now() - 1000) })
			.where(eq(classSessions.id, s.id));
		expect(await classByCode(s.code)).toBeNull();
		expect(await rows(s.id)).toEqual({ sessions: 0, seats: 0, answers: 0 });
		expect(await status(getClassSession(teacher, s.id))).toBe(404);
	});

	it('belongs to the teacher who started it: another sees no such session', async () => {
		const teacher = await makeUser('teacher');
		const other = await makeUser('other');
		const s = await startClassSession(teacher, { experiment: 'span', step: 0 });
		expect(await status(getClassSession(other, s.id))).toBe(404);
		expect(await status(updateClassSession(other, s.id, { revealed: true }))).toBe(404);
		expect(await status(endClassSession(other, s.id))).toBe(404);
		expect(await status(getClassSession(null, s.id))).toBe(401);
		expect(await status(startClassSession(null, { experiment: 'span', step: 0 }))).toBe(401);
		expect((await getClassSession(teacher, s.id)).revealed).toBe(false);
	});

	it('refuses an unknown experiment or step, and more open sessions than the limit', async () => {
		const teacher = await makeUser('teacher');
		expect(await status(startClassSession(teacher, { experiment: 'gravity', step: 0 }))).toBe(422);
		expect(await status(startClassSession(teacher, { experiment: 'span', step: 4 }))).toBe(422);
		for (let i = 0; i < OPEN_SESSIONS_PER_HOST; i++)
			await startClassSession(teacher, { experiment: 'creep', step: 0 });
		expect(await status(startClassSession(teacher, { experiment: 'creep', step: 0 }))).toBe(409);
	});

	it('takes a seat of this session only: another session’s token is refused', async () => {
		const teacher = await makeUser('teacher');
		const a = await startClassSession(teacher, { experiment: 'span', step: 0 });
		const b = await startClassSession(teacher, { experiment: 'span', step: 0 });
		const { seat } = await joinClass(a.code, 'Eli');
		expect(await status(answerClass(b.code, { seat, choice: 'x4' }))).toBe(403);
	});
});

describe('what the class sends', () => {
	it('reads a join code as typed from a screen, and a nickname without control characters', () => {
		expect(joinCodeSchema.parse(' k7q-mpx ')).toBe('K7QMPX');
		expect(joinCodeSchema.safeParse('K7QMP0').success).toBe(false); // no zero
		expect(nicknameSchema.parse('  Ana   María ')).toBe('Ana María');
		expect(nicknameSchema.safeParse('<b>x</b>').success).toBe(false);
		expect(nicknameSchema.safeParse('a\u202Eb').success).toBe(false);
		expect(nicknameSchema.safeParse('x'.repeat(25)).success).toBe(false);
	});

	it('takes only the choice with an answer: a step sent along is ignored', async () => {
		const teacher = await makeUser('teacher');
		const s = await startClassSession(teacher, { experiment: 'span', step: 0 });
		const { seat } = await joinClass(s.code, 'Fay');
		const res = await answerApi.PUT(
			event({
				actor: null,
				method: 'PUT',
				params: { code: s.code.toLowerCase() },
				body: { seat, choice: 'x8', step: 3 }
			})
		);
		expect(res.status).toBe(200);
		expect(await res.json()).toMatchObject({ nickname: 'Fay', step: 0, choice: 'x8' });
	});
});

describe('rate limits of the class routes', () => {
	it('refuses joins past the budget of one address, and not another address', async () => {
		const teacher = await makeUser('teacher');
		const s = await startClassSession(teacher, { experiment: 'span', step: 0 });
		const join = (i: number, address: string) =>
			seatsApi.POST(
				event({
					actor: null,
					method: 'POST',
					params: { code: s.code },
					body: { nickname: `Student ${i} ${address.slice(-2)}` },
					address
				})
			);
		for (let i = 0; i < CLASS_JOIN_BUDGET.points; i++)
			expect((await join(i, '198.51.100.7')).status).toBe(201);
		const refused = await join(999, '198.51.100.7');
		expect(refused.status).toBe(429);
		expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
		expect((await join(1000, '198.51.100.8')).status).toBe(201);
	});

	it('refuses every lookup from an address that has guessed too many codes', async () => {
		const teacher = await makeUser('teacher');
		const s = await startClassSession(teacher, { experiment: 'span', step: 0 });
		const look = (code: string) =>
			classApi.GET(event({ actor: null, params: { code }, address: '203.0.113.99' }));
		expect((await look(s.code)).status).toBe(200);
		for (let i = 0; i < CLASS_MISS_BUDGET.points; i++)
			expect((await look(`ZZZZ${'23456789'[i % 8]}${'ABCDEFGH'[i % 8]}`)).status).toBe(404);
		const res = await look(s.code);
		expect(res.status).toBe(429);
		expect((await res.json()).error).toMatch(/unknown join codes/);
		expect(
			(await classApi.GET(event({ actor: null, params: { code: s.code }, address: '203.0.113.1' })))
				.status
		).toBe(200);
	});
});
