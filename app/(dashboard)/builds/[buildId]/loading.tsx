import { Skeleton } from "@/components/ui/states";

export default function BuildLoading() {
  return (
    <section className="space-y-5" role="status" aria-label="Loading the build">
      <Skeleton className="h-32 w-full" />
      <Skeleton className="h-72 w-full" />
      <Skeleton className="h-40 w-full" />
    </section>
  );
}
