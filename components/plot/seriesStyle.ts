/** Dash patterns by series index, so series differ by more than colour (also in print). */
export const SERIES_DASHES = ['', '7 4', '2 3', '10 3 2 3', '4 2'];
