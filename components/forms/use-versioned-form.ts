"use client";

// A form checked in the browser by the schema the server parses with, whose save names the version it
// was opened at. A refusal (400) puts the server's messages on the fields and keeps what was typed; a
// stale save (409) keeps the stored record beside the form until the user chooses, so nothing is
// overwritten unasked.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path, type Resolver } from "react-hook-form";
import type { z } from "zod";
import type { Comparison } from "@/components/forms/conflict-panel";
import { ApiError } from "@/lib/client/api";

type Options<V extends Record<string, string>, S extends { version: number }, O> = {
  schema: z.ZodType<O, FieldValues>;
  /** The record being edited; none for a new one. */
  stored?: S;
  toValues: (stored?: S) => V;
  /** The form's fields as the comparison names them; server errors on other names are not the form's. */
  labels: Record<keyof V, string>;
  /** The fields an edit can change, in the comparison's order; all labelled fields by default. */
  compared?: readonly (keyof V)[];
  /** Whether a stored and a typed value count as the same; by default equal text once trimmed (the server trims). */
  same?: (theirs: string, yours: string) => boolean;
  /** How a value reads in the comparison, e.g. a code's label. */
  shown?: (field: keyof V, values: V) => string;
  /** Their version by reloading the page, where the page around the form shows the record too. */
  reloadForTheirs?: boolean;
  /** Sends the save; resolves to the record's new version where the form stays open on it. */
  send: (fields: O, version: number) => Promise<number | void>;
};

export function useVersionedForm<V extends Record<string, string>, S extends { version: number }, O>(options: Options<V, S, O>) {
  const { labels, toValues } = options;
  const router = useRouter();
  const [version, setVersion] = useState(options.stored?.version ?? 0);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ theirs: S; rows: Comparison } | null>(null);
  const form = useForm<V, unknown, O>({
    // The schema's input type is looser than the form's strings (blank → null), hence the cast.
    resolver: zodResolver(options.schema) as unknown as Resolver<V, unknown, O>,
    defaultValues: toValues(options.stored) as DefaultValues<V>,
    mode: "onTouched",
  });

  function compare(theirs: S): Comparison {
    const stored = toValues(theirs);
    const mine = form.getValues();
    const same = options.same ?? ((a: string, b: string) => a.trim() === b.trim());
    const shown = options.shown ?? ((field: keyof V, values: V) => values[field]);
    return (options.compared ?? (Object.keys(labels) as (keyof V)[]))
      .filter((k) => !same(stored[k], mine[k]))
      .map((k) => ({ field: String(k), label: labels[k], theirs: shown(k, stored), yours: shown(k, mine) }));
  }

  async function save(fields: O, asVersion = version) {
    setRefusal(null);
    try {
      const next = await options.send(fields, asVersion);
      if (next !== undefined) setVersion(next);
    } catch (error) {
      if (!(error instanceof ApiError)) return setRefusal("The server could not be reached. Nothing was saved.");
      if (error.status === 409 && error.body.current) {
        const theirs = error.body.current as S;
        return setConflict({ theirs, rows: compare(theirs) });
      }
      for (const [field, messages] of Object.entries(error.fields)) {
        if (field in labels) form.setError(field as Path<V>, { message: messages.join(" ") });
      }
      setRefusal(`${error.message} Nothing was saved; your entries are still here.`);
    }
  }

  return {
    form,
    refusal,
    submit: form.handleSubmit((fields) => save(fields)),
    // The props of a ConflictPanel while a save is waiting on the user's choice.
    conflict: conflict && {
      rows: conflict.rows,
      onLoadTheirs() {
        if (options.reloadForTheirs) return window.location.reload();
        form.reset(toValues(conflict.theirs));
        setVersion(conflict.theirs.version);
        setConflict(null);
        router.refresh();
      },
      // Saving over theirs names their version, so the server takes it as a deliberate overwrite.
      onKeepMine() {
        setVersion(conflict.theirs.version);
        setConflict(null);
        void form.handleSubmit((fields) => save(fields, conflict.theirs.version))();
      },
    },
  };
}
