'use client';
// A new layout from a bay template, a starter layout or custom bare-metal dimensions.
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { BAY_LIMITS } from '@/lib/layout/vocabulary';
import { LENGTH_UNITS, parseLength, type LengthUnit } from '@/lib/layout/units';
import type { MemberDto } from '@/db/studios';
import type { LayoutDto } from '@/db/layouts';

/** A bay template as the picker shows it; the page passes them from `lib/layout/templates` (server side, so the schema that validates them stays off the client). */
export interface BayTemplateChoice {
  id: string;
  name: string;
  bay: { length: number; width: number; height: number };
}

const STARTERS = [
  { id: 'starter-l-lounge', name: 'L-shaped lounge that makes up into a king bed (L2H2)' },
  { id: 'starter-rear-bed', name: 'Fixed rear bed with side kitchen (L3H2)' },
];

const length = (what: string) =>
  z.string().check(z.trim(), z.refine((s) => s === '' || parseLength(s) !== null, `type the ${what} as a number, e.g. 3100, 310 cm or 122 in`));

const schema = z
  .object({
    name: z.string().check(z.trim(), z.minLength(1, 'give the layout a name'), z.maxLength(120)),
    clientId: z.string(),
    start: z.enum(['template', 'starter', 'custom']),
    bayTemplateId: z.string(),
    starterId: z.string(),
    unit: z.enum(LENGTH_UNITS),
    length: length('length'),
    width: length('width'),
    height: length('height'),
  })
  .check(z.superRefine((v, ctx) => {
    if (v.start !== 'custom') return;
    for (const key of ['length', 'width', 'height'] as const) {
      const mm = parseLength(v[key], v.unit as LengthUnit);
      if (mm === null) ctx.addIssue({ code: 'custom', path: [key], message: `enter the bay ${key}` });
      else if (mm < BAY_LIMITS[key].min || mm > BAY_LIMITS[key].max) ctx.addIssue({ code: 'custom', path: [key], message: `between ${BAY_LIMITS[key].min} mm and ${BAY_LIMITS[key].max / 1000} m` });
    }
  }));
type Values = z.infer<typeof schema>;

export function NewLayoutForm({ templates }: { templates: BayTemplateChoice[] }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const members = useQuery({ queryKey: ['members'], queryFn: () => apiFetch<{ members: MemberDto[] }>('/api/studio/members') });
  const clients = (members.data?.members ?? []).filter((m) => m.role === 'client');
  const { register, handleSubmit, watch, setError, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { name: '', clientId: '', start: 'template', bayTemplateId: 'l2h2', starterId: STARTERS[0].id, unit: 'mm', length: '', width: '', height: '' },
  });
  const start = watch('start');

  const create = useMutation({
    mutationFn: (v: Values) => {
      const base = { name: v.name, clientId: v.clientId || null };
      const body =
        v.start === 'template' ? { ...base, bayTemplateId: v.bayTemplateId }
        : v.start === 'starter' ? { ...base, starterId: v.starterId }
        : { ...base, bay: { length: parseLength(v.length, v.unit)!, width: parseLength(v.width, v.unit)!, height: parseLength(v.height, v.unit)!, wheelArches: [], doors: [], bulkhead: true, cabSeats: 2 } };
      return apiFetch<LayoutDto>('/api/layouts', { method: 'POST', json: body });
    },
    onSuccess: (layout) => {
      // The layouts table must show the new layout when the designer goes back to it.
      queryClient.invalidateQueries({ queryKey: ['layouts'] });
      toast.success(`Created “${layout.name}”`);
      router.push(`/layouts/${layout.id}`);
    },
    onError: (err) => {
      if (err instanceof ApiError && err.issues.length) {
        for (const issue of err.issues) {
          const key = issue.path.split('.').pop() as keyof Values;
          setError(key in schema.shape ? key : 'name', { message: issue.message });
        }
      } else toast.error(err.message);
    },
  });

  const error = (key: keyof Values) => formState.errors[key] && <p className="field-error">{formState.errors[key]?.message}</p>;

  return (
    <form onSubmit={handleSubmit((v) => create.mutate(v))} className="space-y-6" noValidate>
      <div>
        <label className="label" htmlFor="name">Layout name</label>
        <input id="name" className="field" placeholder="e.g. Nair — weekender" {...register('name')} />
        {error('name')}
      </div>
      <div>
        <label className="label" htmlFor="clientId">Client</label>
        <select id="clientId" className="field" {...register('clientId')}>
          <option value="">No client yet</option>
          {clients.map((c) => <option key={c.userId} value={c.userId}>{c.name}</option>)}
        </select>
        {members.isError && <p className="field-error">Could not load the studio’s clients.</p>}
      </div>
      <fieldset>
        <legend className="label">Start from</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          {([['template', 'A bay template'], ['starter', 'A starter layout'], ['custom', 'My own measurements']] as const).map(([value, label]) => (
            <label key={value} className="inline-flex items-center gap-2">
              <input type="radio" value={value} {...register('start')} /> {label}
            </label>
          ))}
        </div>
      </fieldset>
      {start === 'template' && (
        <div>
          <label className="label" htmlFor="bayTemplateId">Bay size class</label>
          <select id="bayTemplateId" className="field" {...register('bayTemplateId')}>
            {templates.map((t) => (
              <option key={t.id} value={t.id}>{t.name} — {t.bay.length} × {t.bay.width} × {t.bay.height} mm</option>
            ))}
          </select>
          <p className="mt-1 text-xs text-ink-soft">Typical values for the class — measure your own van and correct them in the bay panel.</p>
        </div>
      )}
      {start === 'starter' && (
        <div>
          <label className="label" htmlFor="starterId">Starter layout</label>
          <select id="starterId" className="field" {...register('starterId')}>
            {STARTERS.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
          </select>
        </div>
      )}
      {start === 'custom' && (
        <fieldset className="space-y-3">
          <legend className="label">Bare-metal load space</legend>
          <div className="grid grid-cols-4 gap-3">
            {(['length', 'width', 'height'] as const).map((k) => (
              <div key={k}>
                <label className="text-xs text-ink-soft" htmlFor={k}>{k === 'length' ? 'Length (bulkhead to rear door)' : k === 'width' ? 'Width (wall to wall)' : 'Height (floor to roof)'}</label>
                <input id={k} className="field font-mono" inputMode="decimal" {...register(k)} />
                {error(k)}
              </div>
            ))}
            <div>
              <label className="text-xs text-ink-soft" htmlFor="unit">Unit</label>
              <select id="unit" className="field" {...register('unit')}>
                {LENGTH_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
              </select>
            </div>
          </div>
          <p className="text-xs text-ink-soft">A number alone is read in the chosen unit; you may also type “310 cm” or “122 in”.</p>
        </fieldset>
      )}
      <button type="submit" className="btn-primary" disabled={create.isPending}>{create.isPending ? 'Creating…' : 'Create layout'}</button>
    </form>
  );
}
