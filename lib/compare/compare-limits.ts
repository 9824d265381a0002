/** How many sizes one comparison (and one Fit card) holds. Free of the marking reader, for browser code. */
export const MAX_COMPARED_SIZES = 4;
