/** The reference people quote on the phone: Q- and the id, zero-padded. */
export function quoteReference(id: number): string {
	return `Q-${String(id).padStart(5, '0')}`;
}
