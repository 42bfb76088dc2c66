import type { ReactNode } from "react";
import { Button } from "./button";
import { Notice } from "./card";

/**
 * A form's one message above its fields: the refusal's own message, unless it is already shown beside one of
 * `hideFor`; with `countFields`, how many fields need attention when only the form's own check spoke.
 */
export function FormError({
  form,
  hideFor,
  countFields = false,
}: {
  form: { formError: string | null; errors: Record<string, string> };
  hideFor?: readonly string[];
  countFields?: boolean;
}) {
  const { formError, errors } = form;
  if (formError) return hideFor?.some((k) => errors[k]) ? null : <Notice tone="error">{formError}</Notice>;
  const count = Object.keys(errors).length;
  if (!countFields || count === 0) return null;
  return <Notice tone="error">{count === 1 ? "One field needs attention." : `${count} fields need attention.`}</Notice>;
}

/** The submit button, saying what it is doing while the form is on its way. */
export function SubmitButton({ pending, busy, disabled, className, children }: { pending: boolean; busy: string; disabled?: boolean; className?: string; children: ReactNode }) {
  return (
    <Button type="submit" disabled={pending || disabled} className={className}>
      {pending ? busy : children}
    </Button>
  );
}
