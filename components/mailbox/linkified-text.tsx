import { Fragment } from "react";

const URL_PATTERN = /(https?:\/\/[^\s<>"')\]]+)/g;

/** Plain text of an e-mail with every http(s) URL turned into a link; line breaks kept. */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <pre className="whitespace-pre-wrap break-words font-mono text-sm leading-relaxed text-kraft-900">
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="font-medium text-foam-600 underline underline-offset-2 hover:text-foam-800">
            {part}
          </a>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </pre>
  );
}
