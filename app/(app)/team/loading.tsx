import { LoadingState } from "@/components/shell/route-states";

export default function TeamLoading() {
  return <LoadingState what="team page" />;
}
