// Plain text with its web addresses made into links (http and https only, so a "javascript:" text stays text).
const URL_PATTERN = /(https?:\/\/[^\s<>"')\]]+)/g;

export function LinkedText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <>
      {parts.map((part, i) => (i % 2 === 1 ? <a key={i} className="break-all text-accent underline" href={part} target="_blank" rel="noreferrer noopener">{part}</a> : part))}
    </>
  );
}
