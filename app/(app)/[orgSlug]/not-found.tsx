import { NotFoundState } from "@/components/shell/page-state";

// Inside the organisation's layout, so the header and its navigation stay on screen.
export default function OrgNotFound() {
  return (
    <div className="py-10">
      <NotFoundState />
    </div>
  );
}
