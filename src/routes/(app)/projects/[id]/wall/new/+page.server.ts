import { requireActor, requireRole } from '$lib/server/access';
import { getProject } from '$lib/server/projects';
import { wallDesignSchema } from '$lib/schemas/wall';
import { saveAnalysis } from '../../save-analysis.server';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals, params }) => {
	const actor = requireActor(locals.actor);
	const { project } = getProject(actor, params.id);
	// a new wall is an editor's: viewers read saved ones
	const { role } = requireRole(actor, project.workshopId, 'editor');
	return { project: { id: project.id, name: project.name }, role };
};

export const actions: Actions = {
	save: (event) => saveAnalysis(event, 'wall', wallDesignSchema, 'wall')
};
