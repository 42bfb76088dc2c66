import { LoadingState } from "@/components/shell/page-state";

export default function OrgLoading() {
  return <LoadingState />;
}
