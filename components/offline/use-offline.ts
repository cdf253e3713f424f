"use client";
import { useEffect, useState, useSyncExternalStore } from "react";
import { isReachable, listQueue, listSaved, OFFLINE_CHANGED, offlineSupported, subscribeConnection, type QueuedMark, type SavedModule } from "@/lib/offline/browser";

/** Whether Riser can be reached from this phone (lib/offline: browser events, then Riser's own answer). */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribeConnection, isReachable, () => true);
}

type OfflineState = { ready: boolean; supported: boolean; saved: SavedModule[]; queue: QueuedMark[] };

async function load(): Promise<OfflineState> {
  if (!offlineSupported()) return { ready: true, supported: false, saved: [], queue: [] };
  const [saved, queue] = await Promise.all([listSaved(), listQueue()]);
  return { ready: true, supported: true, saved, queue };
}

/** What this phone keeps and what waits to be sent, re-read whenever either changes. */
export function useOfflineState(): OfflineState {
  const [state, setState] = useState<OfflineState>({ ready: false, supported: true, saved: [], queue: [] });
  useEffect(() => {
    let live = true;
    const read = () => void load().then((s) => live && setState(s));
    read();
    window.addEventListener(OFFLINE_CHANGED, read);
    return () => {
      live = false;
      window.removeEventListener(OFFLINE_CHANGED, read);
    };
  }, []);
  return state;
}
