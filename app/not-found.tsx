export default function NotFound() {
  return (
    <section className="py-12">
      <h1 className="text-xl font-semibold">Nothing here</h1>
      <p className="mt-2 text-sm text-ink-soft">That build, run or case does not exist. Go back to the latest builds.</p>
    </section>
  );
}
