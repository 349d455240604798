// A message's plain text with its web links made clickable (so the maker can follow a reset or
// verification link), everything else shown as it is. React escapes the text; only http(s) links.
const LINK = /(https?:\/\/[^\s<>"]+)/g;

interface MailTextProps {
  text: string;
}

export function MailText({ text }: MailTextProps) {
  const parts = text.split(LINK);
  return (
    <pre className="panel overflow-x-auto whitespace-pre-wrap p-4 font-sans text-sm" data-testid="captured-mail-text">
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="break-all text-accent underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}
