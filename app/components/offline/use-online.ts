import { useEffect, useState } from "react";

// Once per page load: can the server be reached? A page the service worker served with no signal
// may still have navigator.onLine true (browsers differ), so a failed request counts as no signal too.
let reachable: Promise<boolean> | null = null;
const probe = () =>
  (reachable ??= fetch("/healthz", { method: "HEAD", cache: "no-store" }).then(
    () => true,
    () => false,
  ));

/** Whether the browser says it has a connection (true until read on the phone, as the server drew the page). */
export function useOnline(): boolean {
  const [online, setOnline] = useState(true);
  useEffect(() => {
    let live = true;
    const read = () => {
      setOnline(navigator.onLine);
      if (navigator.onLine) void probe().then((ok) => live && !ok && setOnline(false));
    };
    const back = () => {
      reachable = null;
      read();
    };
    read();
    window.addEventListener("online", back);
    window.addEventListener("offline", read);
    return () => {
      live = false;
      window.removeEventListener("online", back);
      window.removeEventListener("offline", read);
    };
  }, []);
  return online;
}
