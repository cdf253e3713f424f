import type { ReactNode, ThHTMLAttributes } from "react";

export type TableColumn<R> = {
  key: string;
  header: ReactNode;
  cell: (row: R) => ReactNode;
  /** classes for this column's cells (td) */
  className?: string;
  /** classes for its header cell, replacing the default padding and alignment */
  headerClassName?: string;
  /** attributes for its header cell (aria-sort) */
  headerProps?: ThHTMLAttributes<HTMLTableCellElement>;
  /** the cell names its row (rendered as <th scope="row">) */
  rowHeader?: boolean;
};

type Props<R> = {
  /** the scrollable region's accessible name (and the caption unless `caption` is given) */
  label: string;
  caption?: ReactNode;
  columns: TableColumn<R>[];
  rows: R[];
  rowKey: (row: R) => string | number;
  /** shown instead of the table when there are no rows */
  empty?: ReactNode;
  /** padding of cells: "normal" px-3 py-2, "compact" px-2 py-2 */
  density?: "normal" | "compact";
  className?: string;
  tableProps?: React.TableHTMLAttributes<HTMLTableElement> & { "data-testid"?: string };
  /** attributes for a row (a test id) */
  rowProps?: (row: R) => React.HTMLAttributes<HTMLTableRowElement> & { "data-testid"?: string };
  /** show the caption above the table instead of for screen readers only */
  captionVisible?: boolean;
};

/**
 * Riser's table: a keyboard-scrollable region (narrow screens scroll sideways, not the page), a
 * caption for screen readers, scoped header cells and zebra-free rows with rules between them.
 * Server- and client-safe (no hooks).
 */
export function Table<R>({ label, caption, columns, rows, rowKey, empty, density = "normal", className = "", tableProps, rowProps, captionVisible = false }: Props<R>) {
  if (rows.length === 0 && empty !== undefined) return <>{empty}</>;
  const pad = density === "compact" ? "px-2 py-2" : "px-3 py-2";
  return (
    <div role="region" aria-label={label} tabIndex={0} className={`relative overflow-x-auto rounded border border-line bg-panel ${className}`}>
      <table className="w-full border-collapse text-left text-sm" {...tableProps}>
        <caption className={captionVisible ? "px-3 py-2 text-left font-bold" : "sr-only"}>{caption ?? label}</caption>
        <thead className="bg-paper">
          <tr className="border-b border-line">
            {columns.map((c) => (
              <th key={c.key} scope="col" className={`font-bold ${c.headerClassName ?? `${pad} align-bottom`}`} {...c.headerProps}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={rowKey(r)} className="border-b border-line last:border-b-0" {...rowProps?.(r)}>
              {columns.map((c) =>
                c.rowHeader ? (
                  <th key={c.key} scope="row" className={`${pad} align-top font-normal ${c.className ?? ""}`}>
                    {c.cell(r)}
                  </th>
                ) : (
                  <td key={c.key} className={`${pad} align-top ${c.className ?? ""}`}>
                    {c.cell(r)}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
