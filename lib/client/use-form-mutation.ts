"use client";

import { useMutation, type MutateOptions } from "@tanstack/react-query";
import { useState } from "react";
import { ClientError, fieldsOf } from "./fetch";

type Fields = Record<string, string>;

/**
 * The one form pattern: a TanStack mutation on the fetch client, plus the field messages shown beside the
 * controls. Those come from the form's own check (`refuse`) or from the server's refusal, mapped to the form's
 * field names by `fieldsFrom` when they differ; each stays until its field is changed (`clear`) or the form is sent.
 */
export function useFormMutation<TVars, TData>(options: {
  mutationFn: (vars: TVars) => Promise<TData>;
  onSuccess?: (data: TData, vars: TVars) => unknown;
  onError?: (error: Error, vars: TVars) => unknown;
  fieldsFrom?: (fields: Fields) => Fields;
  /** What to say when the server could not be reached (no refusal came back); by default the browser's message. */
  offline?: string;
}) {
  const [errors, setErrors] = useState<Fields>({});
  const mutation = useMutation<TData, Error, TVars>({
    mutationFn: options.mutationFn,
    onSuccess: (data, vars) => {
      setErrors({});
      return options.onSuccess?.(data, vars);
    },
    onError: (error, vars) => {
      const fields = fieldsOf(error);
      setErrors(options.fieldsFrom ? options.fieldsFrom(fields) : fields);
      return options.onError?.(error, vars);
    },
  });
  const error = mutation.error;
  return {
    mutation,
    errors,
    pending: mutation.isPending,
    /** The refusal's message (or the offline one), while the last answer was a refusal. */
    formError: error ? (error instanceof ClientError || !options.offline ? error.message : options.offline) : null,
    /** Sends, forgetting the last answer's messages first. */
    submit: (vars: TVars, opts?: MutateOptions<TData, Error, TVars>) => {
      setErrors({});
      mutation.mutate(vars, opts);
    },
    /** The form's own check refused: show its messages and forget the last answer. */
    refuse: (fields: Fields) => {
      mutation.reset();
      setErrors(fields);
    },
    /** Drops the messages of fields that were just changed; the next check says whether they still hold. */
    clear: (changed: (key: string) => boolean) =>
      setErrors((e) => (Object.keys(e).some(changed) ? Object.fromEntries(Object.entries(e).filter(([k]) => !changed(k))) : e)),
    reset: () => {
      mutation.reset();
      setErrors({});
    },
  };
}

export type FormMutation = ReturnType<typeof useFormMutation<never, unknown>>;
