/** Streaming fallback for list pages. Not used above pages that call notFound()/forbidden(): once a
 * fallback has streamed, the status code is already 200. */
export function LoadingState() {
  return (
    <div className="mx-auto flex max-w-6xl items-center gap-3 px-4 py-16 text-steel-600" role="status">
      <span className="h-4 w-4 animate-spin rounded-full border-2 border-steel-300 border-t-oil-500" aria-hidden="true" />
      Loading…
    </div>
  );
}
