import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageHeading } from "@/components/studio/page-heading";
import { Panel } from "@/components/ui/panel";
import { formatTimestamp } from "@/lib/client/format";
import { isMailboxEnabled, listMailbox } from "@/lib/mail/mailbox";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Dev mailbox", robots: { index: false } };

/** Every message the local SMTP fake has stored, newest first. */
export default async function MailboxPage() {
  if (!isMailboxEnabled()) notFound();
  const messages = await listMailbox();

  return (
    <>
      <PageHeading
        eyebrow="Local SMTP fake"
        title="Dev mailbox"
        lead={`${messages.length} message${messages.length === 1 ? "" : "s"} sent by this app. Nothing here left the machine.`}
      />
      <Panel title="Inbox">
        {messages.length === 0 ? (
          <p className="text-sm text-kraft-700">No messages yet. Invitations and password resets appear here.</p>
        ) : (
          <ul className="-mx-5 flex flex-col" aria-label="Messages">
            {messages.map((m) => (
              <li key={m.id} className="border-b border-kraft-100 last:border-0">
                <Link
                  href={`/mailbox/${m.id}`}
                  className="grid gap-1 px-5 py-3 hover:bg-kraft-50 focus-visible:bg-kraft-50 sm:grid-cols-[1fr_auto]"
                >
                  <span className="min-w-0">
                    <span className="block truncate text-sm font-bold text-foam-800">{m.subject}</span>
                    <span className="block truncate text-xs text-kraft-700">to {m.to}</span>
                  </span>
                  <span className="text-xs whitespace-nowrap text-kraft-700">{formatTimestamp(m.date)}</span>
                </Link>
              </li>
            ))}
          </ul>
        )}
      </Panel>
    </>
  );
}
