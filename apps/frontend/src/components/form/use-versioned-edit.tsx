import { useState, type ReactNode } from 'react';
import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import { StaleEditAlert, staleCurrent } from '@/components/stale-edit-alert';

/**
 * The edit of a record that carries a version (a supplier, product, instrument, account),
 * or its creation. Submitting runs `save` with the checked values, the copy the edit is made
 * on (null for a new record) and the version to send; the server's field errors land on the
 * fields. When someone else saved the record meanwhile (a 409 with the record as it is now),
 * `alerts` says so and lets the user load theirs or save theirs over it; the server's other
 * messages stand there too. Put `alerts` above the fields and `onSubmit` on the form.
 */
export function useVersionedEdit<T extends FieldValues, O, R extends { version: number }>({
  form,
  fields,
  record,
  toInput,
  mutation,
  what,
  save,
}: {
  form: UseFormReturn<T, unknown, O>;
  fields: readonly Path<T>[];
  /** The record as the form opened on it; null for a new one. */
  record: R | null;
  /** The form's values for a record, to load the one saved meanwhile. */
  toInput: (record: R) => T;
  /** The mutation the form sends: its other errors show in `alerts`; reset when theirs is loaded. */
  mutation: { error: unknown; reset: () => void };
  /** The record in words: "this supplier". */
  what: string;
  save: (values: O, base: R | null, version: number | undefined) => Promise<unknown>;
}): { onSubmit: ReturnType<typeof submitWithServerErrors>; alerts: ReactNode } {
  // The copy the edit is made on: its fields tell what the user changed, its version goes along.
  const [base, setBase] = useState(record);
  // The record as someone else saved it after this form was opened (a 409), until resolved.
  const [theirs, setTheirs] = useState<R | null>(null);

  const submit = (version?: number) =>
    submitWithServerErrors(form, fields, async (values) => {
      try {
        await save(values, base, version ?? base?.version);
      } catch (error) {
        const current = staleCurrent<R>(error);
        if (!current) throw error;
        setTheirs(current);
      }
    });
  const onSaveMine = () => {
    const version = theirs?.version;
    setTheirs(null);
    void submit(version)();
  };
  const onLoadTheirs = () => {
    if (!theirs) return;
    form.reset(toInput(theirs));
    setBase(theirs);
    setTheirs(null);
    mutation.reset();
  };

  return {
    onSubmit: submit(),
    alerts: (
      <>
        {theirs && (
          <StaleEditAlert
            what={what}
            onLoadTheirs={onLoadTheirs}
            onSaveMine={onSaveMine}
            saving={form.formState.isSubmitting}
          />
        )}
        <ServerErrorAlert error={theirs ? null : mutation.error} fields={fields} />
      </>
    ),
  };
}

/**
 * The usual `save` of a register's dialog: creates the record from `body` when there is no
 * base, otherwise sends the fields `patch` finds changed on the base's id and the version.
 */
export function createOrUpdate<T extends { id: number; version: number }, B, P, R>(
  base: T | null,
  version: number | undefined,
  body: B,
  send: {
    create: (body: B) => Promise<R>;
    update: (change: { id: number; version: number; patch: P }) => Promise<R>;
    /** The fields of `body` that differ from the base. */
    patch: (body: B, base: T) => P;
  },
): Promise<R> {
  return base
    ? send.update({ id: base.id, version: version ?? base.version, patch: send.patch(body, base) })
    : send.create(body);
}
