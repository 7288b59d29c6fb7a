import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LinkifiedText } from "@/components/mailbox/linkified-text";
import { PageHeading } from "@/components/studio/page-heading";
import { Panel } from "@/components/ui/panel";
import { TextLink } from "@/components/ui/text-link";
import { formatTimestamp } from "@/lib/client/format";
import { isMailboxEnabled, readMailboxMessage } from "@/lib/mail/mailbox";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Dev mailbox message", robots: { index: false } };

export default async function MailboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  if (!isMailboxEnabled()) notFound();
  const { id } = await params;
  const message = await readMailboxMessage(id);
  if (!message) notFound();

  return (
    <>
      <p className="mb-4 text-sm">
        <TextLink href="/mailbox">← All messages</TextLink>
      </p>
      <PageHeading eyebrow="Dev mailbox" title={message.subject} />
      <div className="flex flex-col gap-6">
        <Panel>
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-kraft-700">From</dt>
            <dd className="break-all">{message.from}</dd>
            <dt className="text-kraft-700">To</dt>
            <dd className="break-all">{message.to}</dd>
            <dt className="text-kraft-700">Date</dt>
            <dd>{formatTimestamp(message.date)}</dd>
          </dl>
        </Panel>
        <Panel title="Text">
          <LinkifiedText text={message.text || "(no text part)"} />
        </Panel>
        {message.html ? (
          <Panel title="HTML (sandboxed)">
            <iframe
              title={`HTML body of “${message.subject}”`}
              sandbox=""
              srcDoc={message.html}
              className="h-96 w-full border border-kraft-200 bg-white"
            />
          </Panel>
        ) : null}
      </div>
    </>
  );
}
