// Shared by the build and the browser: the figure's fixed sizes.

/** Radius in px of a drawn point (the page keeps it on screen at any zoom). */
export const POINT_RADIUS = 4.5;

/** Curves are drawn beyond the window by this fraction of its size on every side, so panning and zooming out show more. */
export const MARGIN = 0.5;
