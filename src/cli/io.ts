/** Where the CLI writes; tests pass collectors instead of the process streams. */
export interface CliIo {
	out: (text: string) => void;
	err: (text: string) => void;
	readFile: (path: string) => Promise<string>;
}
