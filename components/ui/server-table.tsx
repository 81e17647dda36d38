"use client";

import { flexRender, type Table } from "@tanstack/react-table";

type Props<Row> = {
  table: Table<Row>;
  /** The server's sort key for a column, or undefined when the column does not sort. */
  sortKeyOf: (columnId: string) => string | undefined;
  sort: string;
  dir: string;
  onSort: (key: string, dir: "asc" | "desc") => void;
  empty: string | null;
  minWidth: string;
  cellClass?: string;
};

// The table markup the server-sorted lists share: sortable headers with aria-sort, rows, an empty row.
export function ServerTable<Row>({ table, sortKeyOf, sort, dir, onSort, empty, minWidth, cellClass = "align-middle" }: Props<Row>) {
  const columns = table.getAllLeafColumns().length;
  return (
    <div className="overflow-x-auto rounded border border-rule bg-card">
      <table className="w-full text-left text-sm" style={{ minWidth }}>
        <thead className="border-b border-rule bg-paper-deep">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const key = sortKeyOf(header.column.id);
                const active = key !== undefined && key === sort;
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th key={header.id} scope="col" className="px-3 py-2 font-semibold" aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : undefined}>
                    {key ? (
                      <button type="button" className="font-semibold hover:underline" onClick={() => onSort(key, active && dir === "asc" ? "desc" : "asc")}>
                        {label}
                        <span aria-hidden="true">{active ? (dir === "asc" ? " ▲" : " ▼") : ""}</span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule last:border-0">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`px-3 py-2 ${cellClass}`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {empty && (
            <tr>
              <td colSpan={columns} className="px-3 py-10 text-center text-ink-soft">
                {empty}
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  );
}
