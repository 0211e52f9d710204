/**
 * Which check the side column shows and whether it is open. Shared by the page's status badge and
 * the check tabs. (Showing a finding on the drawing goes through FindingFocus.)
 */
export class ChecksView {
	tab = $state('drive');
	open = $state(true);

	show(tab: string) {
		this.tab = tab;
		this.open = true;
	}
}
