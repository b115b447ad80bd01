import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { AuthForm } from "@/components/auth/auth-form";

export const metadata = { title: "Finish making your account" };

/** Opening the mailed link changes nothing by itself (mail scanners open links too): the button does. */
export default async function SignupFinishPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <AuthCard title="Finish making your account">
      <p className="mb-4 text-sm text-ink-soft">One click makes your Sinkwise account and signs you in.</p>
      <AuthForm action="/api/v1/auth/signup-confirm" submitLabel="Make my account" redirectTo="/builds" extra={{ token }} fields={[]} />
      <p className="mt-5 text-sm text-ink-soft">
        <Link href="/signin" className="hover:text-ember">Sign in instead</Link>
      </p>
    </AuthCard>
  );
}
