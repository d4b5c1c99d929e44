import Link from 'next/link';
import type { Metadata } from 'next';
import { AuthCard } from '@/components/auth/AuthCard';
import { SignUpForm } from '@/components/auth/SignUpForm';

export const metadata: Metadata = { title: 'Start a studio' };

export default function SignUpPage() {
  return (
    <AuthCard title="Start a studio" footer={<>Already have an account? <Link className="text-copper underline" href="/sign-in">Sign in</Link></>}>
      <SignUpForm />
    </AuthCard>
  );
}
