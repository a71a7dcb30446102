import { z } from 'zod';

/**
 * Join codes: six characters a student reads off a projector and types on a phone. Letters and
 * digits that are easy to tell apart (no 0/O, 1/I/L); what is typed is read in either case, with
 * spaces and dashes ignored.
 */
export const JOIN_CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const JOIN_CODE_LENGTH = 6;

export const joinCodeSchema = z
	.string()
	.max(20)
	.transform((s) => s.replace(/[\s-]/g, '').toUpperCase())
	.pipe(
		z
			.string()
			.regex(
				new RegExp(`^[${JOIN_CODE_ALPHABET}]{${JOIN_CODE_LENGTH}}$`),
				`A join code is ${JOIN_CODE_LENGTH} letters and digits, as shown on the teacher's screen.`
			)
	)
	.meta({ description: 'The six-character join code shown on the teacher’s screen' });

/** A student's nickname: the only thing a student tells the server about themselves. */
export const nicknameSchema = z
	.string()
	.transform((s) => s.normalize('NFC').replace(/\s+/g, ' ').trim())
	.pipe(
		z
			.string()
			.min(1, 'Type a nickname: any name the class will know you by.')
			.max(24, 'At most 24 characters.')
			// letters, marks, digits, spaces and a little punctuation; no control or format characters
			.regex(/^[\p{L}\p{M}\p{N} .'_-]+$/u, "Letters, digits, spaces and . ' _ - only.")
	);

export const joinClassSchema = z.object({ nickname: nicknameSchema });

/** The seat token a phone got when it joined (base64url of 24 random bytes). */
const seatTokenSchema = z
	.string()
	.regex(/^[\w-]{32}$/, 'Join the session again.')
	.meta({ description: 'The seat token returned when joining' });

export const answerClassSchema = z.object({
	seat: seatTokenSchema,
	choice: z
		.string()
		.regex(/^[\w.-]{1,16}$/, 'Choose one of the answers.')
		.meta({ description: 'The id of one of the current question’s choices' })
});

/** Starting a session: which of the lab's experiments, from which step. */
export const startClassSchema = z.object({
	experiment: z
		.string()
		.regex(/^[a-z][a-z-]{0,39}$/, 'Choose an experiment.')
		.meta({ description: 'The id of one of the lab’s experiments' }),
	step: z.coerce.number().int().min(0).max(50).default(0)
});

/** The teacher moves the session on: a step of the experiment, and whether its answer is shown. */
export const updateClassSchema = z
	.object({
		step: z.number().int().min(0).max(50).optional(),
		revealed: z.boolean().optional()
	})
	.refine((v) => v.step !== undefined || v.revealed !== undefined, {
		message: 'Send a step, or whether the answer is revealed.'
	});

/** The host screen's buttons, sent as a form. */
export const classActionSchema = z.object({
	to: z.coerce.number().int().min(0).max(50).optional()
});
