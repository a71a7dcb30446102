/** An error page's words for a status: a title, what it means, and the server's own message when
 * it adds something (it names the field or the role); never a stack trace. */
export function explainError(status: number, message: string) {
	const own = (generic: string[]) =>
		message && !generic.includes(message.trim()) ? message : null;
	if (status === 404)
		return {
			title: 'Nothing here',
			detail:
				'This address leads nowhere: it may be mistyped, the page may have been deleted, or it belongs to a workshop you are not a member of.',
			message: null
		};
	if (status === 401)
		return {
			title: 'Sign in first',
			detail: 'This page is for signed-in members. Sign in and you come straight back here.',
			message: null
		};
	if (status === 403)
		return {
			title: 'Not with your role',
			detail: 'You can see this workshop, but your role does not allow this.',
			message: own(['Forbidden'])
		};
	if (status === 429)
		return {
			title: 'Too many tries',
			detail: 'Wait a little, then try again.',
			message: own(['Too Many Requests'])
		};
	if (status >= 400 && status < 500)
		return {
			title: 'That request could not be used',
			detail: 'What was sent did not make sense to the server. Go back and send the form again.',
			message: own(['Bad Request', 'Unsupported Media Type'])
		};
	return {
		title: 'Something went wrong on our side',
		detail: 'This is our fault, not yours. What you saved before is kept; try again in a moment.',
		message: null
	};
}
