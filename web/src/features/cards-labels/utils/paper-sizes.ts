/** The two paper sizes people print on here: US Letter (most of our users) and A4. */
export type PaperSize = 'letter' | 'a4';

/** What the print preview and the `@page` rule need for one kind of sheet on one paper. */
export interface SheetGeometry {
  /** The printed page, as CSS lengths. */
  pageWidth: string;
  pageHeight: string;
  /** `@page` margin (top/bottom then left/right). */
  margin: string;
  /** The printable area the sheet fills. A hair shorter than page minus margins, so rounding never spills a page. */
  innerWidth: string;
  innerHeight: string;
  /** The page width in CSS px (96 per inch), to scale the on-screen preview. */
  pageWidthPx: number;
}

export interface PaperSpec {
  id: PaperSize;
  label: string;
  /** The `@page { size }` keyword. */
  cssSize: 'letter' | 'A4';
  cards: SheetGeometry;
  labels: SheetGeometry & {
    columns: number;
    rows: number;
    labelWidth: string;
    labelHeight: string;
    /** Plain words for the label size, shown beside the choice. */
    sizeWords: string;
  };
}

/** Fact cards per printed page: a 2 × 2 grid, so a card folds into a quarter page. */
export const CARDS_PER_SHEET = 4;

const LETTER_PX = 8.5 * 96;
const A4_PX = (210 / 25.4) * 96;

export const PAPERS: Record<PaperSize, PaperSpec> = {
  letter: {
    id: 'letter',
    label: 'US Letter (8.5 × 11 in)',
    cssSize: 'letter',
    cards: {
      pageWidth: '8.5in',
      pageHeight: '11in',
      margin: '0.4in',
      innerWidth: '7.7in',
      innerHeight: '10.15in',
      pageWidthPx: LETTER_PX,
    },
    labels: {
      pageWidth: '8.5in',
      pageHeight: '11in',
      margin: '0.45in 0.5in',
      innerWidth: '7.5in',
      innerHeight: '10in',
      pageWidthPx: LETTER_PX,
      columns: 3,
      rows: 10,
      labelWidth: '2.5in',
      labelHeight: '1in',
      sizeWords: '2.5 × 1 in (64 × 25 mm), 30 a page',
    },
  },
  a4: {
    id: 'a4',
    label: 'A4 (210 × 297 mm)',
    cssSize: 'A4',
    cards: {
      pageWidth: '210mm',
      pageHeight: '297mm',
      margin: '10mm',
      innerWidth: '190mm',
      innerHeight: '275mm',
      pageWidthPx: A4_PX,
    },
    labels: {
      pageWidth: '210mm',
      pageHeight: '297mm',
      margin: '10mm 10.5mm',
      innerWidth: '189mm',
      innerHeight: '275mm',
      pageWidthPx: A4_PX,
      columns: 3,
      rows: 11,
      labelWidth: '63mm',
      labelHeight: '25mm',
      sizeWords: '63 × 25 mm (2.5 × 1 in), 33 a page',
    },
  },
};

export function labelsPerSheet(paper: PaperSpec): number {
  return paper.labels.columns * paper.labels.rows;
}
