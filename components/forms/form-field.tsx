import { useId, type ReactElement, cloneElement } from "react";
import type { FieldError } from "react-hook-form";
import { inputClass } from "@/components/ui/field";

// A label, a hint and an error around one form control, with the ARIA links between them.
export function FormField({ label, hint, error, className = "", children }: { label: string; hint?: string; error?: string; className?: string; children: ReactElement<Record<string, unknown>> }) {
  const id = useId();
  const describedBy = error ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      {cloneElement(children, { id, "aria-describedby": describedBy })}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm text-warn">
          {error}
        </p>
      )}
    </div>
  );
}

export function inputProps(error: FieldError | undefined, extra = "") {
  return { className: `${inputClass} ${extra}`, "aria-invalid": error ? true : undefined };
}
