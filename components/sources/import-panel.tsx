"use client";

import Link from "next/link";
import { useState, type DragEvent } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import type { ImportReport, ImportResult } from "@/lib/sources/import-types";
import { ImportPreviewTable, ImportSummary } from "./import-preview-table";

const MAX_BYTES = 2 * 1024 * 1024;
const LINKS_SHOWN = 50;

type Refusal = { message: string; details: string[] };
type Done = { ids: number[]; titles: string[] };

function refusalOf(error: unknown): Refusal {
  if (!(error instanceof ApiError)) return { message: "The server could not be reached. Nothing was saved.", details: [] };
  const details = Object.values(error.fields).flat().filter((d) => d !== error.message);
  return { message: error.message, details };
}

export function ImportPanel({ me }: { me: number }) {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [pasted, setPasted] = useState("");
  // round tells the table a new report came, so that it starts again at its first page.
  const [checked, setChecked] = useState<{ csv: string; report: ImportReport; round: number } | null>(null);
  const [round, setRound] = useState(0);
  const [refusal, setRefusal] = useState<Refusal | null>(null);
  const [busy, setBusy] = useState<"checking" | "importing" | null>(null);
  const [allowDuplicates, setAllowDuplicates] = useState(false);
  const [done, setDone] = useState<Done | null>(null);
  const csv = file?.text ?? pasted;

  async function check(text: string) {
    setRefusal(null);
    setChecked(null);
    setAllowDuplicates(false);
    if (!text.trim()) return setRefusal({ message: "Choose a CSV file or paste its text first.", details: [] });
    setBusy("checking");
    try {
      const report = await api<ImportReport>("/api/sources/import/preview", { body: { csv: text } });
      setChecked({ csv: text, report, round: round + 1 });
      setRound(round + 1);
    } catch (error) {
      setRefusal(refusalOf(error));
    } finally {
      setBusy(null);
    }
  }

  async function choose(chosen: File | undefined) {
    if (!chosen) return;
    setDone(null);
    if (chosen.size > MAX_BYTES) {
      setFile(null);
      setChecked(null);
      return setRefusal({ message: `${chosen.name} is ${(chosen.size / 1024 / 1024).toFixed(1)} MB; one import takes at most 2 MB. Split it into smaller files.`, details: [] });
    }
    const text = await chosen.text();
    setFile({ name: chosen.name, text });
    setPasted("");
    await check(text);
  }

  async function commit() {
    if (!checked) return;
    setBusy("importing");
    setRefusal(null);
    try {
      const result = await api<ImportResult>("/api/sources/import/commit", { body: { csv: checked.csv, allowDuplicates } });
      setDone({ ids: result.ids, titles: checked.report.rows.map((r) => String(r.values.title ?? "")) });
      setChecked(null);
      setFile(null);
      setPasted("");
    } catch (error) {
      setRefusal(refusalOf(error));
      // A refused commit answers with the report as the server sees it now.
      const body = error instanceof ApiError ? (error.body as Partial<ImportReport>) : {};
      if (body.rows && body.summary) {
        setChecked({ csv: checked.csv, report: { rows: body.rows, summary: body.summary }, round: round + 1 });
        setRound(round + 1);
      }
    } finally {
      setBusy(null);
    }
  }

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    void choose(e.dataTransfer.files[0]);
  };

  if (done) return <Imported done={done} me={me} onAgain={() => setDone(null)} />;

  const report = checked?.report;
  const stale = checked !== null && checked.csv !== csv;
  const count = report ? report.summary.ok + (allowDuplicates ? report.summary.duplicates : 0) : 0;
  const ready = report && !stale && report.summary.errors === 0 && (report.summary.duplicates === 0 || allowDuplicates) && count > 0;

  return (
    <div className="grid gap-6">
      <div className="grid gap-4 sm:grid-cols-2">
        <div onDragOver={(e) => e.preventDefault()} onDrop={onDrop} className="flex flex-col gap-2 rounded border border-dashed border-rule bg-card p-4">
          <label htmlFor="import-file" className="text-sm font-semibold text-ink-soft">
            CSV file
          </label>
          <input id="import-file" type="file" accept=".csv,text/csv" onChange={(e) => {
              void choose(e.target.files?.[0]);
              e.target.value = "";
            }} className="text-sm" />
          <p className="text-sm text-ink-faint">{file ? `Chosen: ${file.name}` : "Choose a file or drop it here. It is checked at once."}</p>
        </div>
        <div className="flex flex-col gap-2">
          <label htmlFor="import-paste" className="text-sm font-semibold text-ink-soft">
            Or paste the CSV
          </label>
          <textarea
            id="import-paste"
            rows={5}
            value={pasted}
            spellCheck={false}
            placeholder={"title,object_type,dating\nA Lute Player,painting,1650~"}
            onChange={(e) => (setPasted(e.target.value), setFile(null))}
            className={`${inputClass} font-mono text-sm`}
          />
          <div>
            <Button type="button" variant="quiet" disabled={busy !== null} onClick={() => void check(csv)}>
              {busy === "checking" ? "Checking…" : "Check the file"}
            </Button>
          </div>
        </div>
      </div>

      {refusal && (
        <Notice tone="warn">
          <p>{refusal.message}</p>
          {refusal.details.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {refusal.details.map((d) => <li key={d}>{d}</li>)}
            </ul>
          )}
        </Notice>
      )}

      {report && (
        <>
          <ImportSummary report={report} />
          {stale && <Notice tone="warn">The text has changed since it was checked. Check it again before importing.</Notice>}
          <div className="flex flex-wrap items-center gap-4 border-y border-rule py-3">
            <Button type="button" disabled={!ready || busy !== null} onClick={() => void commit()}>
              {busy === "importing" ? "Importing…" : `Import ${count.toLocaleString("en")} source${count === 1 ? "" : "s"}`}
            </Button>
            {report.summary.duplicates > 0 && (
              <label className="inline-flex items-center gap-2 text-sm">
                <input type="checkbox" checked={allowDuplicates} onChange={(e) => setAllowDuplicates(e.target.checked)} /> Import duplicates anyway
              </label>
            )}
            {report.summary.errors > 0 && <p className="text-sm text-warn">Correct the rows with errors in the file and check it again; nothing is imported until every row is right.</p>}
          </div>
          <ImportPreviewTable key={checked!.round} report={report} />
        </>
      )}
    </div>
  );
}

function Imported({ done, me, onAgain }: { done: Done; me: number; onAgain: () => void }) {
  const n = done.ids.length;
  return (
    <div className="grid gap-4">
      <Notice tone="ok">
        Imported {n.toLocaleString("en")} source{n === 1 ? "" : "s"}. Each is a draft unless its row said “published”.
      </Notice>
      <ul className="grid gap-1 sm:grid-cols-2" aria-label="Imported sources">
        {done.ids.slice(0, LINKS_SHOWN).map((id, i) => (
          <li key={id}>
            <Link href={`/sources/${id}`}>{done.titles[i] || `Source #${id}`}</Link>
          </li>
        ))}
      </ul>
      {n > LINKS_SHOWN && <p className="text-sm text-ink-soft">And {(n - LINKS_SHOWN).toLocaleString("en")} more.</p>}
      <div className="flex flex-wrap gap-3">
        <Link href={`/sources?creator=${me}&sort=created&dir=desc`} className="rounded bg-accent px-4 py-2 text-sm font-semibold text-white no-underline hover:bg-accent-deep">
          See your sources in the list
        </Link>
        <Button type="button" variant="quiet" onClick={onAgain}>
          Import another file
        </Button>
      </div>
    </div>
  );
}
