import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { AuthForm } from "@/components/auth/auth-form";

export const metadata = { title: "Sign in" };

export default function SignInPage() {
  return (
    <AuthCard title="Sign in">
      <AuthForm
        action="/api/v1/auth/signin"
        submitLabel="Sign in"
        redirectTo="/builds"
        fields={[
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password", type: "password", autoComplete: "current-password" },
        ]}
      />
      <p className="mt-5 flex justify-between text-sm text-ink-soft">
        <Link href="/reset" className="hover:text-ember">Forgot the password?</Link>
        <Link href="/signup" className="hover:text-ember">Create an account</Link>
      </p>
    </AuthCard>
  );
}
