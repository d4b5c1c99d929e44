// Test harness: a headless editor store on a known layout, plus a schema check used after edits.
import { layoutDocSchema, emptyLayout, type LayoutDoc } from '@/lib/layout';
import { createEditorStore } from '@/components/editor/store/editorStore';
import type { Module } from '@/lib/layout';

/** An invented high-roof bay in round figures; walls 36 mm (24 + 12), so the lining runs y = 36 … 1764. */
export function testDoc(modules: Module[] = []): LayoutDoc {
  const doc = emptyLayout('Harness van', {
    length: 3400, width: 1800, height: 1900,
    wheelArches: [{ side: 'left', x: 1800, length: 950, width: 210, height: 320 }],
    doors: [{ id: 'slide', wall: 'right', offset: 150, width: 1200 }],
    bulkhead: true, cabSeats: 2,
  });
  doc.buildUp.walls = [{ material: 'Closed-cell foam', thickness: 24 }, { material: 'Plywood lining', thickness: 12 }];
  return { ...doc, modules };
}

export function mod(id: string, over: Partial<Module> = {}): Module {
  return { id, kind: 'drawer-unit', x: 500, y: 500, length: 400, width: 400, elevation: 0, height: 700, facing: 'front', arrangements: ['travel', 'lounge', 'sleep'], ...over };
}

export function harness(modules: Module[] = [], clock = { t: 0 }) {
  const store = createEditorStore({ doc: testDoc(modules), version: 1, now: () => clock.t });
  store.getState().resizeViewport(1000, 600);
  return { store, clock, get: () => store.getState(), byId: (id: string) => store.getState().doc.modules.find((m) => m.id === id) };
}

export function expectValid(doc: LayoutDoc) {
  const r = layoutDocSchema.safeParse(doc);
  if (!r.success) throw new Error('document no longer validates: ' + JSON.stringify(r.error.issues));
}
