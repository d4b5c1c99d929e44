import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="sheet flex min-h-screen flex-col items-center justify-center px-6 text-center">
      <h1 className="text-xl font-semibold">Nothing here</h1>
      <p className="mt-2 text-ink-soft">This page does not exist, or it is not shared with you.</p>
      <Link href="/" className="btn-quiet mt-6">Go to the start page</Link>
    </main>
  );
}
