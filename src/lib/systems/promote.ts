/** What a "Save as a package" form shows after it is sent: the new package, or why not. */
export interface PromoteOutcome {
	promoted?: { id: number; name: string };
	promoteError?: string;
	promoteName?: string;
	/** The quote whose system it was (Inventory → Packages lists several). */
	quoteId?: number;
}
