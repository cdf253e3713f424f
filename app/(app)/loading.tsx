import { LoadingState } from "@/components/shell/route-states";

export default function AppLoading() {
  return <LoadingState />;
}
