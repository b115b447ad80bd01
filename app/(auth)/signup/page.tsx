import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { AuthForm } from "@/components/auth/auth-form";
import { LocalInboxNote } from "@/components/auth/local-inbox-note";

export const metadata = { title: "Create account" };

export default function SignUpPage() {
  return (
    <AuthCard title="Create an account">
      <p className="mb-4 text-sm text-ink-soft">We mail you a link; your account is made when you open it.</p>
      <AuthForm
        action="/api/v1/auth/signup"
        submitLabel="Create account"
        fields={[
          { name: "displayName", label: "Name", type: "text", autoComplete: "name" },
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password (at least 10 characters)", type: "password", autoComplete: "new-password" },
        ]}
      />
      <LocalInboxNote />
      <p className="mt-5 text-sm text-ink-soft">
        Already have one? <Link href="/signin" className="hover:text-ember">Sign in</Link>
      </p>
    </AuthCard>
  );
}
