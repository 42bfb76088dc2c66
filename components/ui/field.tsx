import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

// A disabled control (its own flag or a disabled fieldset) reads as not editable: dashed border, surface
// tint, no-entry cursor; the text keeps AA contrast so the value can still be read.
const control =
  "block w-full rounded-md border border-graphite-400 bg-white px-3 py-2 text-sm text-graphite-900 placeholder:text-graphite-500 aria-[invalid=true]:border-alarm-600 disabled:cursor-not-allowed disabled:border-dashed disabled:bg-maple-100 disabled:text-graphite-600 disabled:shadow-none";

/** A labelled control with its message underneath; the message is tied to the control for screen readers. */
export function Field({ label, name, error, hint, children }: { label: string; name: string; error?: string; hint?: ReactNode; children: ReactNode }) {
  return (
    <div className="space-y-1">
      <label htmlFor={name} className="block text-sm font-medium text-graphite-700">
        {label}
      </label>
      {children}
      {hint && !error && <p className="text-xs text-graphite-600">{hint}</p>}
      {error && (
        <p id={`${name}-error`} role="alert" className="text-xs font-medium text-alarm-700">
          ⚠ {error}
        </p>
      )}
    </div>
  );
}

export function TextInput({ name, error, ...props }: InputHTMLAttributes<HTMLInputElement> & { name: string; error?: string }) {
  return (
    <input
      id={name}
      name={name}
      aria-invalid={error ? true : undefined}
      aria-describedby={error ? `${name}-error` : undefined}
      className={control}
      {...props}
    />
  );
}

export function Select({ name, error, ...props }: SelectHTMLAttributes<HTMLSelectElement> & { name: string; error?: string }) {
  return <select id={name} name={name} aria-invalid={error ? true : undefined} className={control} {...props} />;
}
