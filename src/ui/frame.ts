// Horizontal margins shared by the slab strip and every depth chart, so their depth axes line up.
export const SIDE_MARGIN = { left: 68, right: 20 } as const;
