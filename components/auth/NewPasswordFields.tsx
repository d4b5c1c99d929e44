'use client';
// The "choose a password" pair of fields with the length rule the server also applies (the
// server adds the common-password list and says so under the field).
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import * as z from 'zod/mini';
import { passwordLengthSchema, PASSWORD_MIN } from '@/lib/auth/password-rules';

export const newPasswordPair = z
  .object({ password: passwordLengthSchema, repeat: z.string() })
  .check(z.refine((v) => v.password === v.repeat, { message: 'the two passwords differ', path: ['repeat'] }));

type Pair = { password: string; repeat: string };

export function NewPasswordFields<T extends Pair>({ register, errors, idPrefix, label = 'New password' }: {
  register: UseFormRegister<T>;
  errors: FieldErrors<T>;
  idPrefix: string;
  label?: string;
}) {
  const reg = register as unknown as UseFormRegister<Pair>;
  const errs = errors as FieldErrors<Pair>;
  return (
    <>
      <div>
        <label className="label" htmlFor={`${idPrefix}-password`}>{label}</label>
        <input id={`${idPrefix}-password`} type="password" className="field" autoComplete="new-password" aria-describedby={`${idPrefix}-hint`} {...reg('password')} />
        <p id={`${idPrefix}-hint`} className="mt-1 text-xs text-ink-soft">At least {PASSWORD_MIN} characters, and not a common password. A few unrelated words work well.</p>
        {errs.password && <p className="field-error">{errs.password.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor={`${idPrefix}-repeat`}>Repeat it</label>
        <input id={`${idPrefix}-repeat`} type="password" className="field" autoComplete="new-password" {...reg('repeat')} />
        {errs.repeat && <p className="field-error">{errs.repeat.message}</p>}
      </div>
    </>
  );
}
