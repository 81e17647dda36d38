"use client";

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from "@tanstack/react-table";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ServerTable } from "@/components/ui/server-table";
import { api, ApiError } from "@/lib/client/api";
import { ROLE_LABELS } from "./role-labels";

type Role = keyof typeof ROLE_LABELS;
type UserRow = { id: number; email: string; name: string; role: Role; disabledAt: string | null; lastSignInAt: string | null; createdAt: string; version: number };
type Page = { users: UserRow[]; total: number; page: number; pageSize: number };

const SORTABLE = new Set(["name", "email", "role", "createdAt", "lastSignInAt"]);
const day = (iso: string | null) => (iso ? new Date(iso).toISOString().slice(0, 10) : "—");

export function UsersTable({ selfId }: { selfId: number }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<{ tone: "ok" | "warn"; text: string } | null>(null);

  // The URL holds the table's state, so a view can be shared or bookmarked.
  const state = {
    q: params.get("q") ?? "",
    role: params.get("role") ?? "",
    status: params.get("status") ?? "",
    sort: params.get("sort") ?? "name",
    dir: params.get("dir") ?? "asc",
    page: Number(params.get("page") ?? 1),
  };
  const setState = (patch: Partial<typeof state>) => {
    const next = new URLSearchParams(params.toString());
    for (const [k, v] of Object.entries({ page: 1, ...patch })) {
      if (v === "" || v === undefined || (k === "page" && v === 1)) next.delete(k);
      else next.set(k, String(v));
    }
    router.replace(`${pathname}?${next.toString()}`, { scroll: false });
  };

  const search = new URLSearchParams({ sort: state.sort, dir: state.dir, page: String(state.page), pageSize: "20" });
  if (state.q) search.set("q", state.q);
  if (state.role) search.set("role", state.role);
  if (state.status) search.set("status", state.status);
  const query = useQuery({
    queryKey: ["users", search.toString()],
    queryFn: () => api<Page>(`/api/admin/users?${search.toString()}`),
    placeholderData: keepPreviousData,
  });

  const change = useMutation({
    mutationFn: (v: { user: UserRow; role?: Role; disabled?: boolean }) =>
      api<{ user: UserRow }>(`/api/admin/users/${v.user.id}`, { method: "PATCH", body: { version: v.user.version, role: v.role, disabled: v.disabled } }),
    onSuccess: ({ user }) => setMessage({ tone: "ok", text: `${user.name}: ${user.disabledAt ? "disabled" : ROLE_LABELS[user.role].toLowerCase()}${user.disabledAt ? "" : ", active"}.` }),
    onError: (error) => setMessage({ tone: "warn", text: error instanceof ApiError ? error.message : "The change was not saved." }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["users"] }),
  });

  const columns = useMemo<ColumnDef<UserRow>[]>(
    () => [
      { accessorKey: "name", header: "Name" },
      { accessorKey: "email", header: "E-mail", cell: (c) => <span className="break-all">{c.getValue<string>()}</span> },
      {
        accessorKey: "role",
        header: "Role",
        cell: ({ row }) => (
          <select
            aria-label={`Role of ${row.original.name}`}
            className={`${inputClass} py-1`}
            value={row.original.role}
            disabled={row.original.id === selfId || change.isPending}
            onChange={(e) => change.mutate({ user: row.original, role: e.target.value as Role })}
          >
            {Object.entries(ROLE_LABELS).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        ),
      },
      { accessorKey: "lastSignInAt", header: "Last sign-in", cell: (c) => <span className="font-mono text-sm">{day(c.getValue<string | null>())}</span> },
      { accessorKey: "createdAt", header: "Since", cell: (c) => <span className="font-mono text-sm">{day(c.getValue<string>())}</span> },
      {
        id: "status",
        header: "Status",
        cell: ({ row }) => {
          const u = row.original;
          return (
            <div className="flex items-center gap-2">
              <span className={u.disabledAt ? "font-semibold text-warn" : "text-accent-deep"}>{u.disabledAt ? "Disabled" : "Active"}</span>
              {u.id !== selfId && (
                <Button
                  type="button"
                  variant={u.disabledAt ? "quiet" : "danger"}
                  className="px-2 py-1 text-xs"
                  disabled={change.isPending}
                  onClick={() => change.mutate({ user: u, disabled: !u.disabledAt })}
                >
                  {u.disabledAt ? `Enable ${u.name}` : `Disable ${u.name}`}
                </Button>
              )}
            </div>
          );
        },
      },
    ],
    [change, selfId],
  );

  const sorting: SortingState = [{ id: state.sort, desc: state.dir === "desc" }];
  const data = query.data;
  const table = useReactTable({
    data: data?.users ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    state: { sorting },
    rowCount: data?.total ?? 0,
  });
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <section aria-labelledby="users-heading">
      <h2 id="users-heading" className="sr-only">
        All accounts
      </h2>
      <div className="mb-4 grid gap-3 sm:grid-cols-[2fr_1fr_1fr]">
        <label className="flex flex-col gap-1 text-sm font-semibold text-ink-soft">
          Find by name or e-mail
          <input type="search" defaultValue={state.q} className={inputClass} onChange={(e) => setState({ q: e.target.value })} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold text-ink-soft">
          Show role
          <select value={state.role} className={inputClass} onChange={(e) => setState({ role: e.target.value })}>
            <option value="">Any role</option>
            {Object.entries(ROLE_LABELS).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold text-ink-soft">
          Show status
          <select value={state.status} className={inputClass} onChange={(e) => setState({ status: e.target.value })}>
            <option value="">Active and disabled</option>
            <option value="active">Active</option>
            <option value="disabled">Disabled</option>
          </select>
        </label>
      </div>
      <div aria-live="polite" className="mb-3">
        {message && <Notice tone={message.tone}>{message.text}</Notice>}
        {query.error && <Notice tone="warn">{query.error.message}</Notice>}
      </div>
      <ServerTable
        table={table}
        sortKeyOf={(id) => (SORTABLE.has(id) ? id : undefined)}
        sort={state.sort}
        dir={state.dir}
        onSort={(sort, dir) => setState({ sort, dir })}
        empty={data && data.users.length === 0 ? "No account matches these filters." : null}
        minWidth="720px"
      />
      <div className="mt-3 flex flex-wrap items-center justify-between gap-3 text-sm">
        <span className="text-ink-soft">{data ? `${data.total} account${data.total === 1 ? "" : "s"}` : query.isLoading ? "Loading accounts…" : ""}</span>
        <div className="flex items-center gap-2">
          <Button type="button" variant="quiet" disabled={state.page <= 1} onClick={() => setState({ page: state.page - 1 })}>
            Previous
          </Button>
          <span className="font-mono">
            {state.page} / {pages}
          </span>
          <Button type="button" variant="quiet" disabled={state.page >= pages} onClick={() => setState({ page: state.page + 1 })}>
            Next
          </Button>
        </div>
      </div>
    </section>
  );
}
