/** File-system failures in words, for messages such as "cannot read x.json: no such file". */
const REASONS: Record<string, string> = {
	ENOENT: 'no such file',
	EISDIR: 'it is a folder, not a file',
	ENOTDIR: 'a part of the path is not a folder',
	EACCES: 'permission denied',
	EPERM: 'the operation is not permitted',
	EMFILE: 'too many files are open',
	ENAMETOOLONG: 'the name is too long',
	ELOOP: 'the path loops through links',
	EBUSY: 'the file is busy',
	ENOSPC: 'the disk is full',
	EROFS: 'the file system is read-only'
};

export function fileErrorText(error: unknown): string {
	if (error instanceof Error && 'code' in error) {
		const reason = REASONS[String(error.code)];
		if (reason) return reason;
	}
	const message = error instanceof Error ? error.message : String(error);
	// Node's messages read "CODE: text, syscall 'path'": keep the text only.
	return message.replace(/^[A-Z0-9_]+: /, '').replace(/, \w+ '.*'$/, '');
}
