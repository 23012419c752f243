/**
 * Bounds on what one upload may hold, checked while the file is read so a hostile file costs no
 * more than the bound to refuse. 32,767 characters is a spreadsheet cell's own limit (common
 * practice); a grouped comparison needs far fewer columns and sheets than these.
 */
export const TABLE_LIMITS = {
  maxRows: 2_000_000,
  maxColumns: 1000,
  /**
   * Cells of an XLSX sheet, counting the grid that short rows are padded to. Reading a sheet's XML
   * costs about 2 µs a cell on this machine, so this keeps the worst workbook near a second;
   * larger data sets come as CSV (up to maxRows rows).
   */
  maxCells: 500_000,
  maxSheets: 255,
  maxCellChars: 32_767,
};
