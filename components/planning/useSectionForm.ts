'use client';
/**
 * One build-planning panel's form: react-hook-form over the panel's text fields, validated by
 * its zod schema on every change; whenever the whole form reads cleanly the parsed section is
 * handed up (so results and checks follow each keystroke), and the panel's validity is reported
 * so the page can hold the save while a field is wrong. Defaults are read once, at mount; the
 * page remounts a panel to load another version. Never saves anything itself.
 */
import { useEffect, useRef, useState } from 'react';
import { useForm, type DefaultValues, type FieldValues } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type * as z from 'zod/mini';

export function useSectionForm<I extends FieldValues, O>({ schema, defaults, onParsed, onValidity }: {
  schema: z.ZodMiniType<O, I>;
  defaults: () => I;
  onParsed: (value: O) => void;
  onValidity: (ok: boolean) => void;
}) {
  const [initial] = useState(defaults);
  const form = useForm<I, unknown, O>({ resolver: zodResolver(schema as never), mode: 'onChange', defaultValues: initial as DefaultValues<I> });
  const handlers = useRef({ onParsed, onValidity });
  useEffect(() => {
    handlers.current = { onParsed, onValidity };
  });
  useEffect(() => {
    const sub = form.watch((values) => {
      const result = schema.safeParse(values);
      if (result.success) handlers.current.onParsed(result.data);
      handlers.current.onValidity(result.success);
    });
    return () => sub.unsubscribe();
  }, [form, schema]);
  return form;
}
