import { AuthCard } from "@/components/auth/auth-card";
import { AuthForm } from "@/components/auth/auth-form";
import { LocalInboxNote } from "@/components/auth/local-inbox-note";

export const metadata = { title: "Reset password" };

export default function ResetRequestPage() {
  return (
    <AuthCard title="Reset your password">
      <p className="mb-4 text-sm text-ink-soft">
        We send a link that works once, for one hour, to the address of your account.
      </p>
      <AuthForm
        action="/api/v1/auth/reset-request"
        submitLabel="Send the link"
        fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email" }]}
      />
      <LocalInboxNote />
    </AuthCard>
  );
}
