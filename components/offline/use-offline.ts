"use client";
import { useEffect, useState, useSyncExternalStore } from "react";
import { listQueue, listSaved, OFFLINE_CHANGED, offlineSupported, type QueuedMark, type SavedModule } from "@/lib/offline/browser";

function subscribeOnline(onChange: () => void) {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
}

/** Whether the browser says it is online, following its online/offline events. */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);
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
