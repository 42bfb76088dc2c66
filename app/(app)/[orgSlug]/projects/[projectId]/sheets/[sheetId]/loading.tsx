import { LoadingState } from "@/components/shell/page-state";

export default function SheetLoading() {
  return <LoadingState label="Opening the sheet…" />;
}
