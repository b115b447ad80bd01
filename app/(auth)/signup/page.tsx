import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { AuthForm } from "@/components/auth/auth-form";

export const metadata = { title: "Create account" };

export default function SignUpPage() {
  return (
    <AuthCard title="Create an account">
      <AuthForm
        action="/api/v1/auth/signup"
        submitLabel="Create account"
        redirectTo="/builds"
        fields={[
          { name: "displayName", label: "Name", type: "text", autoComplete: "name" },
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password (at least 10 characters)", type: "password", autoComplete: "new-password" },
        ]}
      />
      <p className="mt-5 text-sm text-ink-soft">
        Already have one? <Link href="/signin" className="hover:text-ember">Sign in</Link>
      </p>
    </AuthCard>
  );
}
