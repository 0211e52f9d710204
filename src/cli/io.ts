/** Where the CLI writes; tests pass collectors instead of the process streams. */
export interface CliIo {
	out: (text: string) => void;
	err: (text: string) => void;
	readFile: (path: string) => Promise<string>;
	/** The file's raw bytes, for readers that decide the encoding themselves. */
	readBytes?: (path: string) => Promise<Uint8Array>;
}
