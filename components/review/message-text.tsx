import { linkify } from "@/lib/review/linkify";

/** A message as plain text (React escapes it; no HTML is rendered), its web links clickable and opened safely. */
export function MessageText({ text, className = "", newTab = true }: { text: string; className?: string; newTab?: boolean }) {
  return (
    <p className={`whitespace-pre-wrap break-words ${className}`} data-testid="message-text">
      {linkify(text).map((piece, i) => piece.href
        ? <a key={i} href={piece.href} target={newTab ? "_blank" : undefined} rel="noopener noreferrer nofollow ugc" className="text-copper-700 underline break-all">{piece.text}</a>
        : <span key={i}>{piece.text}</span>)}
    </p>
  );
}
