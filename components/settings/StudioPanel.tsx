'use client';
// Studio-wide preferences: display units and the defaults the checks start from.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { apiFetch } from '@/lib/api/client-fetch';
import type { StudioDto } from '@/db/studios';

const optionalMm = z.string().check(z.trim(), z.refine((s) => s === '' || (/^\d+$/.test(s) && Number(s) <= 2000), 'whole millimetres, up to 2000'));
const schema = z.object({
  name: z.string().check(z.trim(), z.minLength(1, 'name the studio'), z.maxLength(80)),
  units: z.enum(['mm', 'cm', 'in']),
  walkwayMin: optionalMm,
  bedAllowance: optionalMm,
  mattressRegion: z.enum(['', 'uk', 'eu', 'us']),
});
type Values = z.infer<typeof schema>;

export function StudioPanel({ studio }: { studio: StudioDto }) {
  const qc = useQueryClient();
  const isOwner = studio.role === 'owner';
  const form = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: {
      name: studio.name,
      units: studio.units,
      walkwayMin: studio.checkDefaults.walkwayMin?.toString() ?? '',
      bedAllowance: studio.checkDefaults.bedAllowance?.toString() ?? '',
      mattressRegion: studio.checkDefaults.mattressRegion ?? '',
    },
  });
  const save = useMutation({
    mutationFn: (v: Values) =>
      apiFetch<StudioDto>('/api/studio', {
        method: 'PATCH',
        json: {
          name: v.name,
          units: v.units,
          checkDefaults: {
            ...(v.walkwayMin ? { walkwayMin: Number(v.walkwayMin) } : {}),
            ...(v.bedAllowance ? { bedAllowance: Number(v.bedAllowance) } : {}),
            ...(v.mattressRegion ? { mattressRegion: v.mattressRegion } : {}),
          },
        },
      }),
    onSuccess: () => {
      toast.success('Studio settings saved');
      qc.invalidateQueries();
    },
    onError: (err) => toast.error(err.message),
  });
  const err = (k: keyof Values) => form.formState.errors[k] && <p className="field-error">{form.formState.errors[k]?.message}</p>;

  return (
    <section className="panel p-5">
      <h2 className="text-lg font-semibold">Studio</h2>
      <form className="mt-3 grid gap-4 sm:grid-cols-2" onSubmit={form.handleSubmit((v) => save.mutate(v))} noValidate>
        <fieldset disabled={!isOwner} className="contents">
          <div className="sm:col-span-2"><label className="label" htmlFor="s-name">Name</label><input id="s-name" className="field" {...form.register('name')} />{err('name')}</div>
          <div>
            <label className="label" htmlFor="s-units">Show lengths in</label>
            <select id="s-units" className="field" {...form.register('units')}><option value="mm">millimetres</option><option value="cm">centimetres</option><option value="in">inches</option></select>
          </div>
          <div>
            <label className="label" htmlFor="s-region">Mattress sizes</label>
            <select id="s-region" className="field" {...form.register('mattressRegion')}><option value="">Default (UK)</option><option value="uk">UK</option><option value="eu">EU</option><option value="us">US</option></select>
          </div>
          <div><label className="label" htmlFor="s-walk">Minimum walkway (mm)</label><input id="s-walk" className="field font-mono" placeholder="450" {...form.register('walkwayMin')} />{err('walkwayMin')}</div>
          <div><label className="label" htmlFor="s-bed">Bed length allowance (mm)</label><input id="s-bed" className="field font-mono" placeholder="100" {...form.register('bedAllowance')} />{err('bedAllowance')}</div>
          {isOwner ? (
            <div className="sm:col-span-2"><button className="btn-primary" type="submit" disabled={save.isPending}>{save.isPending ? 'Saving…' : 'Save settings'}</button></div>
          ) : (
            <p className="text-sm text-ink-soft sm:col-span-2">Only the studio owner can change these.</p>
          )}
        </fieldset>
      </form>
    </section>
  );
}
