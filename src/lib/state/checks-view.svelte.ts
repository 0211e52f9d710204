/**
 * Which check the side column shows, whether it is open, and which electrodes a finding last
 * asked the drawing to show. Shared by the page's status badge, the check tabs and the editor.
 */
export class ChecksView {
	tab = $state('drive');
	open = $state(true);
	/** Electrodes to select and frame; `serial` changes with every request, even for the same ids. */
	reveal = $state.raw<{ ids: readonly string[]; serial: number } | null>(null);

	show(tab: string) {
		this.tab = tab;
		this.open = true;
	}

	revealElectrodes(ids: readonly string[]) {
		this.reveal = { ids, serial: (this.reveal?.serial ?? 0) + 1 };
	}
}
