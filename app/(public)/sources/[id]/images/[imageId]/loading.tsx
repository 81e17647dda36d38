export default function ImageViewerLoading() {
  return (
    <div aria-busy="true" className="animate-pulse">
      <p className="sr-only">Opening the photograph…</p>
      <div className="mb-4 h-10 w-2/3 rounded bg-paper-deep" />
      <div className="h-[70vh] rounded border border-rule bg-paper-deep" />
    </div>
  );
}
