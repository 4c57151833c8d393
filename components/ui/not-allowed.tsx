// Shown in place of a page's content when the caller's role does not allow it.
export function NotAllowed({ message }: { message: string }) {
  return <p role="alert" className="mx-auto max-w-xl px-4 py-10 text-ink-soft">{message}</p>;
}
