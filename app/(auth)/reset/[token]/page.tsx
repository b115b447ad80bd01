import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { AuthForm } from "@/components/auth/auth-form";

export const metadata = { title: "Choose a new password" };

export default async function ResetConfirmPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <AuthCard title="Choose a new password">
      <AuthForm
        action="/api/v1/auth/reset-confirm"
        submitLabel="Set the password"
        extra={{ token }}
        fields={[{ name: "password", label: "New password (at least 10 characters)", type: "password", autoComplete: "new-password" }]}
      />
      <p className="mt-5 text-sm text-ink-soft">
        <Link href="/signin" className="hover:text-ember">Back to sign in</Link>
      </p>
    </AuthCard>
  );
}
