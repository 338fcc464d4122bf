// A react-hook-form form validated by a shared zod schema whose submit calls the API: field
// errors inline (client or server), anything else as one banner message, `busy` while in flight.
import { useState } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyServerError } from '@/lib/form-errors';

export function useApiForm<S extends z.ZodType<FieldValues, FieldValues>>(opts: {
  schema: S;
  defaultValues: DefaultValues<z.input<S>>;
  send: (values: z.output<S>) => Promise<unknown>;
  /** Server error codes that belong to one field, e.g. { email_taken: 'email' }. */
  fieldsByCode?: Partial<Record<string, Path<z.input<S>>>>;
}) {
  const [banner, setBanner] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const form = useForm<z.input<S>, unknown, z.output<S>>({
    resolver: zodResolver(opts.schema),
    defaultValues: opts.defaultValues,
  });
  const submit = form.handleSubmit(async (values) => {
    setBanner(null);
    setBusy(true);
    try {
      await opts.send(values);
    } catch (e) {
      setBanner(applyServerError(e, form.setError, opts.fieldsByCode));
    } finally {
      setBusy(false);
    }
  });
  return { form, control: form.control, submit, banner, setBanner, busy };
}
