/** Axis and grid strokes the desk's charts share: quiet lines, text in the page's grey. */
export const axisStyle = { stroke: 'var(--gray-11)', fontSize: 12 } as const;
export const gridStyle = { stroke: 'var(--gray-5)', strokeDasharray: '3 3' } as const;

/** Colours with a meaning that repeats across charts; the words beside them say it too. */
export const seriesColors = {
  sunlight: 'var(--amber-9)',
  infrared: 'var(--red-9)',
  reference: 'var(--gray-9)',
  result: 'var(--accent-9)',
  faint: 'var(--gray-7)',
} as const;

/**
 * What every chart of the desk sets on its frame: the width of its box at a fixed height,
 * room for axis labels, and no keyboard layer (the figure's text and table stand in for it).
 */
export function chartFrame(height: number, top = 8) {
  return {
    responsive: true,
    style: { width: '100%', height },
    margin: { top, right: 16, bottom: 8, left: 8 },
    accessibilityLayer: false,
  } as const;
}
