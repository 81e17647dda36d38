import { useId, type InputHTMLAttributes, type SelectHTMLAttributes } from "react";

type Common = { label: string; hint?: string; errors?: string[] };

export const inputClass =
  "w-full rounded border border-rule bg-card px-3 py-2 text-base text-ink placeholder:text-ink-faint aria-[invalid=true]:border-warn";

export function TextField({ label, hint, errors, ...input }: Common & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  const described = errors?.length ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <input id={id} aria-invalid={errors?.length ? true : undefined} aria-describedby={described} className={inputClass} {...input} />
      {hint && !errors?.length && (
        <p id={`${id}-hint`} className="text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {errors?.length ? (
        <p id={`${id}-error`} className="text-sm text-warn">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export function SelectField({ label, errors, children, ...select }: Common & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <select id={id} aria-invalid={errors?.length ? true : undefined} className={inputClass} {...select}>
        {children}
      </select>
      {errors?.length ? <p className="text-sm text-warn">{errors.join(" ")}</p> : null}
    </div>
  );
}
