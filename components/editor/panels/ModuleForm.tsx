'use client';
/**
 * The Details panel's form for one module, with react-hook-form and zod: lengths typed in any
 * unit, a change applied when the field is left or Enter is pressed, as one undo entry. A value
 * that does not read is named beside its field as it is typed, never holds the focus (WCAG 2.1
 * SC 2.1.2): Escape puts the last valid value back, and leaving the field does too, with a note
 * saying the edit was not applied and why. Loaded
 * on first selection (it carries the form libraries), so the editor's first load stays small.
 * Never writes the document except through store actions.
 */
import { useEffect, useId, useMemo, useState, type KeyboardEvent } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { toast } from '@/components/ui/toast';
import { useShallow } from 'zustand/react/shallow';
import { ARRANGEMENTS, FACINGS, MOUNTS, SURFACE_CHOICES } from '@/lib/layout/vocabulary';
import type { Module } from '@/lib/layout/schema';
import { KIND_LIST, kindFacts, kindSpec, shownFields } from '@/lib/layout/kinds';
import { FACING_WORDS, MOUNT_WORDS, SURFACE_WORDS } from '@/lib/layout/field-words';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { formValuesOf, moduleFormSchema, readModuleForm, type ModuleFormValues, type ModuleFormOutput, type ModuleFormField } from './moduleForm';
import { CommandButton } from './CommandButton';
import { commitAfterNextPaint } from '@/components/ui/afterNextPaint';


export default function ModuleForm({ module }: { module: Module }) {
  const api = useEditorApi();
  const { units, readOnly } = useEditor(useShallow((s) => ({ units: s.units, readOnly: s.readOnly })));
  const schema = useMemo(() => moduleFormSchema(units), [units]);
  const formId = useId();
  // Checked as typed (the message shows beside the field); never moves the focus to a bad field.
  const form = useForm<ModuleFormValues, unknown, ModuleFormOutput>({ resolver: zodResolver(schema), defaultValues: formValuesOf(module, units), mode: 'onChange', shouldFocusError: false });
  const { register, reset, formState, getValues, setValue, clearErrors } = form;

  // Fields typed in and not yet applied (applying reads them all).
  const [typed] = useState(() => new Set<Path<ModuleFormValues>>());
  // The store is the truth: when the module changes (drag, undo), the fields follow — except what
  // is being typed and not yet applied: an edit of another field reaches the store just after the
  // paint (commitAfterNextPaint), and must not wipe what was typed in the next field since.
  useEffect(() => {
    const kept = [...typed].map((name) => [name, getValues(name)] as const);
    reset(formValuesOf(module, units));
    for (const [name, value] of kept) setValue(name, value as never, { shouldDirty: true });
  }, [module, units, reset, getValues, setValue, typed]);

  // Leaving a field (or Enter, or a choice): what reads applies as one undo entry; what does not
  // goes back to the last valid value with a note saying why.
  const apply = () => {
    typed.clear(); // read now: applied below, or put back with a note
    const r = readModuleForm(module, getValues(), units);
    if (r.reverted.length > 0) {
      for (const f of r.reverted) setValue(f.field, f.restored as never, { shouldValidate: false, shouldDirty: false });
      clearErrors();
      toast.warning(`Not applied: ${r.reverted.map((f) => f.message).join('; ')}. The last valid value is kept.`);
    }
    if (Object.keys(r.patch).length === 0) return;
    // The values are read now, while they are this module's; the store takes them after the
    // paint that shows the focus moving, so the plan's redraw does not hold up that paint.
    const { patch } = r;
    const edited = module;
    commitAfterNextPaint(() => {
      // Enter and then leaving the field within one frame read the same change twice: what the
      // store already holds is not applied again (it would be an undo entry that changes nothing).
      const now = api.getState().doc.modules.find((m) => m.id === edited.id) as Record<string, unknown> | undefined;
      const changed = Object.fromEntries(Object.entries(patch).filter(([k, v]) => !now || JSON.stringify(now[k]) !== JSON.stringify(v))) as typeof patch;
      if (Object.keys(changed).length === 0) return;
      const res = api.getState().updateModule(edited.id, changed, `Edit ${Object.keys(changed).join(', ')}`);
      if (!res.ok) {
        toast.error(`Not applied: ${res.error}`);
        reset(formValuesOf(edited, units));
      }
    });
  };
  /** A text field: marked as typed in as it changes, applied as it is left. */
  const typedField = (name: Path<ModuleFormValues>) => ({ onBlur: () => apply(), onChange: () => void typed.add(name) });
  /** Escape in a field puts its last valid value back and keeps the focus there. */
  const revertOnEscape = (name: ModuleFormField) => (e: KeyboardEvent) => {
    if (e.key !== 'Escape') return;
    setValue(name, formValuesOf(module, units)[name] as never, { shouldDirty: false });
    typed.delete(name);
    clearErrors(name);
  };
  const spec = kindSpec(module.kind);
  const valueFields = shownFields(module);
  const drawnLitres = kindFacts(module).water?.drawnLitres;
  const err = (name: keyof ModuleFormValues) => {
    const e = formState.errors[name];
    return e && 'message' in e && typeof e.message === 'string' ? e.message : undefined;
  };

  const field = (name: 'x' | 'y' | 'length' | 'width' | 'elevation' | 'height', label: string, hint?: string) => (
    <label className="block">
      <span className="text-xs text-ink-soft">{label}{hint ? <span className="text-ink-soft"> · {hint}</span> : null}</span>
      <span className="mt-0.5 flex items-center rounded border border-paper-edge bg-paper focus-within:ring-2 focus-within:ring-copper">
        <input {...register(name, typedField(name))} onKeyDown={revertOnEscape(name)} inputMode="decimal" aria-invalid={!!err(name)} aria-describedby={err(name) ? `${formId}-${name}-error` : undefined} data-testid={`details-${name}`} className="w-full bg-transparent px-2 py-1 font-mono text-sm outline-none" />
        <span className="pr-2 font-mono text-xs text-ink-soft">{units}</span>
      </span>
      {err(name) && <span id={`${formId}-${name}-error`} className="mt-0.5 block text-xs text-brick" data-testid={`details-${name}-error`}>{err(name)}</span>}
    </label>
  );

  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        apply();
      }}
      className="space-y-4 p-4 text-sm"
      aria-label={`Details of ${module.label || spec.title}`}
      data-module-id={module.id}
    >
      <fieldset disabled={readOnly} className="space-y-4">
        <div className="grid grid-cols-2 gap-3">
          <label className="col-span-2 block">
            <span className="text-xs text-ink-soft">Label</span>
            <input {...register('label', typedField('label'))} onKeyDown={revertOnEscape('label')} aria-invalid={!!err('label')} aria-describedby={err('label') ? `${formId}-label-error` : undefined} placeholder={spec.title} className="mt-0.5 w-full rounded border border-paper-edge bg-paper px-2 py-1 outline-none focus:ring-2 focus:ring-copper" />
            {err('label') && <span id={`${formId}-label-error`} className="mt-0.5 block text-xs text-brick">{err('label')}</span>}
          </label>
          <label className="col-span-2 block">
            <span className="text-xs text-ink-soft">Kind</span>
            <select {...register('kind', { onChange: () => apply() })} className="mt-0.5 w-full rounded border border-paper-edge bg-paper px-2 py-1">
              {KIND_LIST.map((k) => <option key={k.kind} value={k.kind}>{k.title}</option>)}
            </select>
          </label>
        </div>
        <div className="grid grid-cols-2 gap-3">
          {field('x', 'Along (x)', 'from bulkhead')}
          {field('y', 'Across (y)', 'from left wall')}
          {field('length', 'Length (x)')}
          {field('width', 'Width (y)')}
          {field('elevation', 'Elevation', 'above floor')}
          {field('height', 'Height')}
        </div>
        <div className="grid grid-cols-2 gap-3">
          <label className="block">
            <span className="text-xs text-ink-soft">Facing</span>
            <select {...register('facing', { onChange: () => apply() })} className="mt-0.5 w-full rounded border border-paper-edge bg-paper px-2 py-1">
              {FACINGS.map((f) => <option key={f} value={f}>{FACING_WORDS[f]}</option>)}
            </select>
          </label>
          <label className="block">
            <span className="text-xs text-ink-soft">Mounted</span>
            <select {...register('mount', { onChange: () => apply() })} data-testid="details-mount" className="mt-0.5 w-full rounded border border-paper-edge bg-paper px-2 py-1">
              {MOUNTS.map((m) => <option key={m} value={m}>{MOUNT_WORDS[m]}</option>)}
            </select>
          </label>
        </div>
        <fieldset>
          <legend className="text-xs text-ink-soft">Exists in, and its top there</legend>
          <div className="mt-1 grid grid-cols-[auto_1fr] items-center gap-x-3 gap-y-1">
            {ARRANGEMENTS.map((a) => (
              <div key={a} className="contents">
                <label className="flex items-center gap-1.5">
                  <input type="checkbox" value={a} {...register('arrangements', { onChange: () => apply() })} className="accent-copper" data-testid={`details-in-${a}`} />
                  {a}
                </label>
                <select
                  {...register(`surfaces.${a}`, { onChange: () => apply() })}
                  aria-label={`Top used as in ${a}`}
                  data-testid={`details-top-${a}`}
                  className="w-full rounded border border-paper-edge bg-paper px-2 py-0.5 text-xs"
                >
                  <option value="">not set</option>
                  {SURFACE_CHOICES.map((c) => <option key={c} value={c}>{SURFACE_WORDS[c]}</option>)}
                </select>
              </div>
            ))}
          </div>
          {err('arrangements') && <span className="mt-0.5 block text-xs text-brick" role="alert">{err('arrangements')}</span>}
        </fieldset>
        <label className="block">
          <span className="text-xs text-ink-soft">Mass</span>
          <span className="mt-0.5 flex items-center rounded border border-paper-edge bg-paper focus-within:ring-2 focus-within:ring-copper">
            <input {...register('massKg', typedField('massKg'))} onKeyDown={revertOnEscape('massKg')} inputMode="decimal" aria-invalid={!!err('massKg')} aria-describedby={err('massKg') ? `${formId}-massKg-error` : undefined} className="w-full bg-transparent px-2 py-1 font-mono text-sm outline-none" />
            <span className="pr-2 font-mono text-xs text-ink-soft">kg</span>
          </span>
          {err('massKg') && <span id={`${formId}-massKg-error`} className="mt-0.5 block text-xs text-brick">{err('massKg')}</span>}
        </label>
        {valueFields.length > 0 && (
          <fieldset className="space-y-2">
            <legend className="text-xs font-medium text-ink-soft">{spec.title} details</legend>
            {valueFields.map(({ key: k, field }) => {
              return field.input === 'boolean' ? (
                <label key={k} className="flex items-center gap-2">
                  <input type="checkbox" {...register(`props.${k}`, { onChange: () => apply() })} className="accent-copper" />
                  {field.label}
                </label>
              ) : (
                <label key={k} className="block">
                  <span className="text-xs text-ink-soft">{field.label}</span>
                  <input {...register(`props.${k}`, typedField(`props.${k}`))} placeholder={k === 'litres' && drawnLitres !== undefined ? `from its drawn size: ${drawnLitres.toFixed(1)}` : undefined} className="mt-0.5 w-full rounded border border-paper-edge bg-paper px-2 py-1 font-mono text-sm" />
                </label>
              );
            })}
          </fieldset>
        )}
      </fieldset>
      {/* Enter in a field applies it: implicit submission needs a submit button in the form. */}
      <button type="submit" className="sr-only" tabIndex={-1} disabled={readOnly}>Apply changes</button>
      {!readOnly && (
        <div className="flex flex-wrap gap-2 border-t border-paper-edge pt-3">
          <CommandButton id="edit.rotate" withLabel />
          <CommandButton id="edit.duplicate" withLabel />
          <CommandButton id="edit.delete" withLabel />
        </div>
      )}
      <p className="text-xs text-ink-soft">Lengths may be typed in mm, cm or in (e.g. “120 cm”, “47 in”).</p>
    </form>
  );
}

