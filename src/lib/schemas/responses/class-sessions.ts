import { z } from 'zod';
import { timestamp } from './common';

const choice = z.object({ id: z.string(), label: z.string() });

/** What the class sees: the step on the screen, its question, and the answer once revealed. */
export const classViewSchema = z
	.object({
		code: z.string().meta({ description: 'The join code' }),
		experiment: z.object({ id: z.string(), title: z.string(), steps: z.number().int() }),
		step: z.number().int().min(0).meta({ description: 'The step on the screen, from 0' }),
		say: z.string().meta({ description: 'What the step shows' }),
		question: z
			.object({ text: z.string(), choices: z.array(choice) })
			.nullable()
			.meta({ description: 'The prediction asked at this step, if any' }),
		revealed: z.boolean(),
		answer: z
			.object({
				choice: z.string(),
				label: z.string(),
				words: z.string().meta({ description: 'The ratio the engine finds, in words' })
			})
			.nullable()
			.meta({ description: 'The right answer, once the teacher has revealed it' }),
		expiresAt: timestamp.meta({ description: 'When the session ends and is deleted' })
	})
	.meta({ id: 'ClassView' });

/** The teacher's view: the class's, with the seats and every answer to the current step. */
export const classHostViewSchema = classViewSchema
	.extend({
		id: z.string(),
		question: z
			.object({
				text: z.string(),
				choices: z.array(choice.extend({ count: z.number().int().min(0) }))
			})
			.nullable(),
		seats: z.number().int().min(0).meta({ description: 'Students who have joined' }),
		answers: z.array(z.object({ nickname: z.string(), choice: z.string(), answeredAt: timestamp }))
	})
	.meta({ id: 'ClassHostView' });

export const classSessionListSchema = z.object({
	items: z.array(classViewSchema.extend({ id: z.string() }))
});

export const classSeatSchema = z.object({
	seat: z.string().meta({ description: 'The seat token: send it with every answer' }),
	nickname: z.string(),
	session: classViewSchema
});

export const classAnswerSchema = z.object({
	nickname: z.string(),
	step: z.number().int(),
	choice: z.string(),
	answeredAt: timestamp
});
