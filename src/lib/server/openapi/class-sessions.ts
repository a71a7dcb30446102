import {
	answerClassSchema,
	joinClassSchema,
	startClassSchema,
	updateClassSchema
} from '$lib/schemas/class-session';
import {
	classAnswerSchema,
	classHostViewSchema,
	classSeatSchema,
	classSessionListSchema,
	classViewSchema
} from '$lib/schemas/responses/class-sessions';
import type { ApiOperation } from './types';

const hosted = { 404: 'No such session, it has ended, or another teacher runs it' };
const unknownCode = { 404: 'No open session has that code (it may have ended)' };

// ---- class sessions: the teacher's side (signed in) and the class's (no account) ----
export const classSessionOperations: ApiOperation[] = [
	{
		operationId: 'listClassSessions',
		method: 'get',
		path: '/class-sessions',
		tag: 'class',
		summary: 'Your class sessions still open, newest first',
		responses: { 200: { description: 'Open sessions', schema: classSessionListSchema } }
	},
	{
		operationId: 'startClassSession',
		method: 'post',
		path: '/class-sessions',
		tag: 'class',
		summary:
			'Start a class session on one of the lab’s experiments; it ends and is deleted after two hours',
		body: startClassSchema,
		responses: {
			201: {
				description: 'Started: the join code and the first step',
				schema: classHostViewSchema
			},
			409: 'Three sessions are open already',
			422: 'Invalid fields, or no such experiment or step'
		}
	},
	{
		operationId: 'getClassSession',
		method: 'get',
		path: '/class-sessions/{id}',
		tag: 'class',
		summary: 'The teacher’s view: the step, every answer to it as it arrives, and the tally',
		responses: { 200: { description: 'The session', schema: classHostViewSchema }, ...hosted }
	},
	{
		operationId: 'updateClassSession',
		method: 'patch',
		path: '/class-sessions/{id}',
		tag: 'class',
		summary: 'Step on (the answer is hidden again) or reveal the right answer',
		body: updateClassSchema,
		responses: {
			200: { description: 'Changed', schema: classHostViewSchema },
			409: 'This step asks no question to reveal',
			422: 'Invalid fields, or no such step',
			...hosted
		}
	},
	{
		operationId: 'endClassSession',
		method: 'delete',
		path: '/class-sessions/{id}',
		tag: 'class',
		summary: 'End the session now: it is deleted with every nickname and answer',
		responses: { 204: { description: 'Ended and deleted' }, ...hosted }
	},
	{
		operationId: 'getClass',
		method: 'get',
		path: '/class/{code}',
		tag: 'class',
		summary: 'What a student’s phone shows: the step, its question, and the answer once revealed',
		auth: 'none',
		rateLimited: true,
		responses: { 200: { description: 'The session', schema: classViewSchema }, ...unknownCode }
	},
	{
		operationId: 'joinClass',
		method: 'post',
		path: '/class/{code}/seats',
		tag: 'class',
		summary: 'Join with a nickname (no account); the seat token is returned once',
		auth: 'none',
		rateLimited: true,
		body: joinClassSchema,
		responses: {
			201: { description: 'Joined', schema: classSeatSchema },
			409: 'The nickname is taken in this session, or the session is full',
			...unknownCode
		}
	},
	{
		operationId: 'answerClass',
		method: 'put',
		path: '/class/{code}/answer',
		tag: 'class',
		summary: 'Answer the current question, or change the answer until it is revealed',
		auth: 'none',
		rateLimited: true,
		body: answerClassSchema,
		responses: {
			200: { description: 'Answer kept', schema: classAnswerSchema },
			403: 'Unknown seat: join the session first',
			409: 'No question at this step, or its answer has been revealed',
			422: 'Invalid fields, or not one of the choices',
			...unknownCode
		}
	}
];
