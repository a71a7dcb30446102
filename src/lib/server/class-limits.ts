/**
 * Budgets of the class routes, which anyone may call without an account. A whole class often
 * shares one school address, so the per-address budgets are sized for a large class; what a single
 * phone may do is counted by its seat. Looking up codes that do not exist is what guessing looks
 * like, so an address that misses too often is refused every lookup for a while.
 * Common practice, no source: the numbers leave a class of 60 room to spare.
 */
import { createHash } from 'node:crypto';
import { consume, limiterFor, tooMany, type Budget } from './rate-limit';

export const CLASS_JOIN_BUDGET: Budget = { prefix: 'class-join', points: 120, seconds: 600 };
export const CLASS_MISS_BUDGET: Budget = { prefix: 'class-miss', points: 20, seconds: 600 };
const CLASS_ANSWER_BUDGET: Budget = { prefix: 'class-answer', points: 600, seconds: 60 };
const SEAT_ANSWER_BUDGET: Budget = { prefix: 'class-seat', points: 20, seconds: 60 };

const wait = (what: string) => (seconds: number) =>
	`Too many ${what} from your address. Try again in ${seconds} s.`;

/** 429 when this address has looked up too many unknown codes lately; null otherwise. */
export async function refuseGuessing(address: string): Promise<Response | null> {
	const used = await limiterFor(CLASS_MISS_BUDGET).get(address);
	if (used && used.consumedPoints >= CLASS_MISS_BUDGET.points)
		return tooMany(wait('unknown join codes'), used.msBeforeNext);
	return null;
}

/** Count one lookup of a code that named no open session. */
export async function countMiss(address: string) {
	await consume(CLASS_MISS_BUDGET, address, wait('unknown join codes'));
}

export async function limitJoin(address: string) {
	return (await refuseGuessing(address)) ?? consume(CLASS_JOIN_BUDGET, address, wait('joins'));
}

export async function limitAnswer(address: string, seat: string) {
	return (
		(await refuseGuessing(address)) ??
		(await consume(CLASS_ANSWER_BUDGET, address, wait('answers'))) ??
		consume(
			SEAT_ANSWER_BUDGET,
			// the token itself is never stored, here either
			createHash('sha256').update(seat).digest('hex'),
			(s) => `Too many answers from this phone. Try again in ${s} s.`
		)
	);
}
