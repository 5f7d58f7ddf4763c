import { useEffect, useState, type ComponentType } from "react";
import type { ToasterProps } from "sonner";
import { whenSonnerWanted } from "../../lib/toast";

/**
 * Where toasts appear: sonner's <Toaster>, started when the app first says something in a toast (src/lib/toast.ts).
 * Draws nothing until then, on the server too, so a page drawn at build time hydrates the same.
 */
export function Toaster(props: ToasterProps) {
  const [Sonner, setSonner] = useState<ComponentType<ToasterProps> | null>(null);
  useEffect(() => {
    let live = true;
    void whenSonnerWanted().then((m) => live && setSonner(() => m.Toaster));
    return () => {
      live = false;
    };
  }, []);
  return Sonner ? <Sonner {...props} /> : null;
}
