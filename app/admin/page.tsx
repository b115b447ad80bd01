import { UserRoles } from "@/components/admin/user-roles";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Admin" };

export default async function AdminPage() {
  const me = await requirePageUser("admin");
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-semibold">Admin</h1>
      <section className="space-y-3">
        <h2 className="text-lg font-medium">Users and roles</h2>
        <UserRoles selfId={me.id} />
      </section>
    </div>
  );
}
