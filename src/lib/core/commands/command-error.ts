/**
 * The error every command throws for arguments it cannot apply (unknown ids, too few points, a
 * zero scale). Commands never half-apply: they throw before producing a patch.
 */
export class CommandError extends Error {
	constructor(message: string) {
		super(message);
		this.name = 'CommandError';
	}
}

export function requireThat(condition: unknown, message: string): asserts condition {
	if (!condition) throw new CommandError(message);
}
