export default function PieceLoading() {
  return (
    <div className="flex flex-col gap-6" aria-busy="true" aria-label="Loading the piece">
      <div className="h-10 w-2/3 animate-pulse rounded-xl bg-card" />
      <div className="min-h-[60vh] animate-pulse rounded-2xl border border-line bg-card" />
    </div>
  );
}
