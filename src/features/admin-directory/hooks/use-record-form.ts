import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, type DefaultValues, type FieldValues, type Path } from 'react-hook-form';
import type { z } from 'zod';
import { useSaveRecord, type DirectoryInput, type DirectoryRecord, type DirectoryResource } from '@/api/directory';
import { applyServerErrors } from '@/lib/apply-server-errors';

interface RecordFormOptions<R extends DirectoryResource, Fields extends FieldValues> {
  resource: R;
  /** The shared create schema: the form's fields in, the request body out. */
  schema: z.ZodType<DirectoryInput<R>, Fields>;
  /** The record being edited, or null for a new one. */
  record: DirectoryRecord<R> | null;
  /** The form's fields: each starts from the record's value of the same name, or empty. */
  names: readonly Path<Fields>[];
  /** Starting values for a new record where empty is not a choice (e.g. a unit). */
  fallback?: Partial<Record<Path<Fields>, string>>;
  onDone: () => void;
}

/** A directory record's form: the shared schema, the record's values, save, and the server's field errors. */
export function useRecordForm<R extends DirectoryResource, Fields extends FieldValues>({ resource, schema, record, names, fallback, onDone }: RecordFormOptions<R, Fields>) {
  const save = useSaveRecord(resource);
  const values = record as Record<string, unknown> | null;
  const defaultValues = Object.fromEntries(names.map((name) => [name, values?.[name] ?? fallback?.[name] ?? ''])) as DefaultValues<Fields>;
  const form = useForm<Fields, unknown, DirectoryInput<R>>({ resolver: zodResolver(schema), defaultValues });
  const onSubmit = form.handleSubmit(async (input) => {
    try {
      await save.mutateAsync({ id: record?.id ?? null, values: input });
      onDone();
    } catch (error) {
      applyServerErrors(form, error, names);
    }
  });
  return { save, register: form.register, control: form.control, errors: form.formState.errors, onSubmit: () => void onSubmit() };
}
