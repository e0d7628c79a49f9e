import { LoadingBlock, Skeleton } from "@/components/ui/states";

export default function CaseLoading() {
  return (
    <div className="space-y-5">
      <Skeleton className="h-7 w-1/2" />
      <LoadingBlock label="Loading the case" rows={3} />
      <Skeleton className="h-64 w-full" />
    </div>
  );
}
