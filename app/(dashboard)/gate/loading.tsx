import { Skeleton } from "@/components/ui/states";

export default function GateLoading() {
  return (
    <section className="space-y-4" role="status" aria-label="Loading the release gate">
      <Skeleton className="h-10 w-1/3" />
      <Skeleton className="h-16 w-full" />
      <Skeleton className="h-96 w-full" />
    </section>
  );
}
