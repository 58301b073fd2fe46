import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";

const CONTROL =
  "mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink aria-[invalid=true]:border-ember";

interface FieldShellProps {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  children: ReactNode;
}

/** The message under a control; its id is the one describedBy gives the control. The "!" marks it without colour. */
function FieldError({ id, error }: { id: string; error?: string }) {
  return error ? (
    <p id={`${id}-error`} className="mt-1 font-bold text-ember-deep">
      <span aria-hidden="true">! </span>
      {error}
    </p>
  ) : null;
}

/** Label, hint and error wired to the control with ids, so screen readers read all three. */
export function FieldShell({ id, label, hint, error, children }: FieldShellProps) {
  return (
    <div className="mb-5">
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      {children}
      <FieldError id={id} error={error} />
    </div>
  );
}

export function describedBy(id: string, hint?: string, error?: string, ...more: (string | undefined)[]): string | undefined {
  const ids = [hint ? `${id}-hint` : null, ...more, error ? `${id}-error` : null].filter(Boolean);
  return ids.length ? ids.join(" ") : undefined;
}

export interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  id: string;
  label: string;
  hint?: string;
  error?: string;
}

export function TextField({ id, label, hint, error, ...input }: TextFieldProps) {
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <input id={id} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, hint, error)} className={CONTROL} {...input} />
    </FieldShell>
  );
}

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  /** `lang` marks an option written in another language, so screen readers pronounce it right. */
  options: { value: string; label: string; lang?: string }[];
}

export function SelectField({ id, label, hint, error, options, ...select }: SelectFieldProps) {
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <select id={id} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, hint, error)} className={CONTROL} {...select}>
        {options.map((o) => (
          <option key={o.value} value={o.value} lang={o.lang}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

export interface TextAreaFieldProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  /** Shown under the box and read with it, e.g. a character count. */
  note?: ReactNode;
}

export function TextAreaField({ id, label, hint, error, note, ...textarea }: TextAreaFieldProps) {
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <textarea
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error, note ? `${id}-note` : undefined)}
        className={`${CONTROL} min-h-40`}
        {...textarea}
      />
      {note ? (
        <p id={`${id}-note`} className="mt-1 text-sm text-ink-soft">
          {note}
        </p>
      ) : null}
    </FieldShell>
  );
}

export interface CheckboxFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "type"> {
  id: string;
  label: ReactNode;
  error?: string;
}

/** A tick box with its label beside it; the error sits under both. */
export function CheckboxField({ id, label, error, ...input }: CheckboxFieldProps) {
  return (
    <div className="mb-5">
      <div className="flex items-start gap-3">
        <input
          id={id}
          type="checkbox"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, undefined, error)}
          className="mt-1 size-6 shrink-0 accent-harbour"
          {...input}
        />
        <label htmlFor={id}>{label}</label>
      </div>
      <FieldError id={id} error={error} />
    </div>
  );
}
