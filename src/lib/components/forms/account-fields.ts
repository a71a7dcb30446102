// The fields that recur on the account forms (sign-in, sign-up, reset, profile): their labels,
// input types and autocomplete words, spread onto a FormField and overridden where one differs.
import type { HTMLInputAttributes } from 'svelte/elements';

type FieldPreset = Pick<HTMLInputAttributes, 'type' | 'autocomplete' | 'inputmode'> & {
	label: string;
	hint?: string;
};

export const PASSWORD_HINT = 'At least 10 characters. A few unrelated words work well.';

export const accountFields = {
	name: { label: 'Your name', autocomplete: 'name' },
	email: { label: 'E-mail', type: 'email', autocomplete: 'email', inputmode: 'email' },
	password: { label: 'Password', type: 'password', autocomplete: 'current-password' },
	newPassword: {
		label: 'Password',
		type: 'password',
		autocomplete: 'new-password',
		hint: PASSWORD_HINT
	},
	repeatPassword: { label: 'The same again', type: 'password', autocomplete: 'new-password' }
} satisfies Record<string, FieldPreset>;
