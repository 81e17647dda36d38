import Link from "next/link";
import { can, type Actor } from "@/lib/auth/policy";
import { AccountMenu } from "./account-menu";
import { NavLink } from "./nav-link";

export function SiteHeader({ actor, devMail }: { actor: Actor | null; devMail: boolean }) {
  const links = [
    { href: "/", label: "Archive" },
    { href: "/search", label: "Search" },
    { href: "/sources", label: "Sources" },
    { href: "/collections", label: "Collections" },
    { href: "/places", label: "Places" },
    // The vocabulary explains the terms of the evidence to everyone; editors also change it there.
    { href: "/vocabulary", label: "Vocabulary" },
    // Anyone may lay regions side by side; what each sees is decided by the table's query.
    { href: "/light-table", label: "Light table" },
    // A reader's own studies: signed-in people only (visitors open public dossiers by their address).
    ...(can(actor, "dossier.manage") ? [{ href: "/dossiers", label: "Dossiers" }] : []),
    ...(can(actor, "review.read_desk") ? [{ href: "/review", label: "Review desk" }] : []),
    ...(can(actor, "user.manage") ? [{ href: "/admin/users", label: "Users" }] : []),
    ...(can(actor, "audit.read") ? [{ href: "/admin/audit", label: "Audit trail" }] : []),
    ...(devMail ? [{ href: "/dev/mail", label: "Mailbox" }] : []),
  ];
  return (
    <header className="border-b border-rule bg-card print:hidden">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 text-ink no-underline" aria-label="Cordarium, the archive">
          <RoseMark />
          <span className="font-serif text-2xl font-semibold tracking-wide">Cordarium</span>
        </Link>
        <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
          <ul className="flex flex-wrap gap-1">
            {links.map((l) => (
              <li key={l.href}>
                <NavLink href={l.href}>{l.label}</NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="ml-auto">
          {actor ? (
            <AccountMenu name={actor.name} email={actor.email} role={actor.role} />
          ) : (
            <Link href="/sign-in" className="rounded border border-accent px-3 py-1.5 text-sm font-semibold no-underline hover:bg-accent-wash">
              Sign in
            </Link>
          )}
        </div>
      </div>
    </header>
  );
}

// A carved soundhole rose, drawn for Cordarium.
function RoseMark() {
  return (
    <svg width="28" height="28" viewBox="0 0 32 32" aria-hidden="true" className="text-accent">
      <circle cx="16" cy="16" r="14" fill="none" stroke="currentColor" strokeWidth="2" />
      <circle cx="16" cy="16" r="9" fill="none" stroke="currentColor" strokeWidth="1.2" />
      {[0, 45, 90, 135].map((a) => (
        <ellipse key={a} cx="16" cy="16" rx="9" ry="3.2" fill="none" stroke="currentColor" strokeWidth="1" transform={`rotate(${a} 16 16)`} />
      ))}
      <circle cx="16" cy="16" r="2" fill="currentColor" />
    </svg>
  );
}
