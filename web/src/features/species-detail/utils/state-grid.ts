import type { StateCode } from '@homeground/shared';

/**
 * A tile map of the 48 conterminous states and DC: each state one square at [column, row],
 * placed near its real neighbours so the shape of a range reads at a glance. Our own layout,
 * drawn as a grid because the page makes no map requests.
 */
export const STATE_TILES: Record<StateCode, [number, number]> = {
  ME: [11, 0],
  WI: [6, 1], MI: [7, 1], VT: [10, 1], NH: [11, 1],
  WA: [1, 2], ID: [2, 2], MT: [3, 2], ND: [4, 2], MN: [5, 2], IL: [6, 2], IN: [7, 2], OH: [8, 2], PA: [9, 2], NY: [10, 2], MA: [11, 2],
  OR: [1, 3], NV: [2, 3], WY: [3, 3], SD: [4, 3], IA: [5, 3], MO: [6, 3], KY: [7, 3], WV: [8, 3], MD: [9, 3], NJ: [10, 3], CT: [11, 3],
  CA: [1, 4], UT: [2, 4], CO: [3, 4], NE: [4, 4], KS: [5, 4], AR: [6, 4], TN: [7, 4], VA: [8, 4], DE: [9, 4], DC: [10, 4], RI: [11, 4],
  AZ: [2, 5], NM: [3, 5], OK: [4, 5], LA: [5, 5], MS: [6, 5], AL: [7, 5], NC: [8, 5], SC: [9, 5],
  TX: [4, 6], GA: [8, 6],
  FL: [9, 7],
};

export const GRID_COLUMNS = 12;
export const GRID_ROWS = 8;
