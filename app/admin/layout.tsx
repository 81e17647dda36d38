import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";

export default async function AdminLayout({ children }: { children: ReactNode }) {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/admin/users");
  if (!can(actor, "user.manage")) {
    return <Notice tone="warn">These pages are for the archive&apos;s administrators. Your role ({actor.role}) does not include them.</Notice>;
  }
  return children;
}
