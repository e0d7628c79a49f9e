import { Skeleton } from "@/components/ui/states";

// Same shape as the run page: header facts, then plot panels.
export default function RunLoading() {
  return (
    <section role="status" aria-label="Loading the run">
      <Skeleton className="h-4 w-80" />
      <Skeleton className="mt-2 h-7 w-96" />
      <div className="mt-4 grid grid-cols-2 gap-4 sm:grid-cols-4 lg:grid-cols-7">
        {Array.from({ length: 7 }, (_, i) => (
          <Skeleton key={i} className="h-9 w-full" />
        ))}
      </div>
      <div className="mt-6 grid gap-4 lg:grid-cols-2">
        <Skeleton className="h-80 w-full" />
        <Skeleton className="h-80 w-full" />
      </div>
    </section>
  );
}
