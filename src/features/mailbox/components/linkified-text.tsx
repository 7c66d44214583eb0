import { Fragment } from 'react';

const urlPattern = /(https?:\/\/[^\s<>"')\]]+)/g;

/** Plain e-mail text with its http(s) addresses made clickable (nothing else is interpreted). */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(urlPattern);
  return (
    <>
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="link break-all" rel="noreferrer">
            {part}
          </a>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </>
  );
}
