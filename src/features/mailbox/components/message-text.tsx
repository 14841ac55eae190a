import { Fragment } from 'react';

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** A captured mail's plain text, with its web addresses (an invite's link) as links to follow. */
export function MessageText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <div className="text-lg leading-relaxed break-words whitespace-pre-wrap">
      {parts.map((part, index) =>
        // split() with a capturing group puts every match at an odd index.
        index % 2 === 1 ? (
          <a key={index} href={part} className="font-semibold text-accent-ink underline underline-offset-4 break-all">
            {part}
          </a>
        ) : (
          <Fragment key={index}>{part}</Fragment>
        ),
      )}
    </div>
  );
}
