/** An error the CLI reports as one line on stderr with a chosen exit code, never a stack trace. */
export class CliError extends Error {
	readonly exitCode: number;
	constructor(message: string, exitCode = 2) {
		super(message);
		this.name = 'CliError';
		this.exitCode = exitCode;
	}
}

/**
 * Exit codes: 0 all checks pass, 1 a design check fails, 2 unreadable or invalid input,
 * 3 an internal error of sunglyph itself (never a verdict on the design).
 */
export const EXIT = { ok: 0, checkFailed: 1, badInput: 2, internal: 3 } as const;

/** Where an internal error should be reported, printed after its one-line message. */
export const REPORT_TO =
	'please report it to the sunglyph maintainers with the command line and the input file';
