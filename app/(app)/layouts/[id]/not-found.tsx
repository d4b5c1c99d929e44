import Link from 'next/link';

export default function LayoutNotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16 text-center">
      <h1 className="text-xl font-semibold">No such layout</h1>
      <p className="mt-2 text-ink-soft">It may have been deleted, or it is not shared with you.</p>
      <Link href="/layouts" className="btn-quiet mt-6">Back to layouts</Link>
    </main>
  );
}
