import { LoadingState } from "@/components/shell/route-states";

export default function AdminLoading() {
  return <LoadingState what="admin page" />;
}
