/** Sets the document title for the page it sits in (React 19 hoists `<title>` into the head). */
export function PageTitle({ title }: { title: string }) {
  return <title>{`${title} · Gramwatt`}</title>;
}
