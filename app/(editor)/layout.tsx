/** The full-screen editor: no app shell, the sketch gets the whole window. */
export default function EditorLayout({ children }: { children: React.ReactNode }) {
  return <div className="fixed inset-0 overflow-hidden bg-paper text-ink">{children}</div>;
}
