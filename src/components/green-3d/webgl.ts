import { useState } from "react";

/**
 * Whether this browser can give us a WebGL context, asked before any Canvas is created (a failed context inside
 * react-three-fiber throws during render). The probe canvas is thrown away; its context is released at once.
 */
export function canUseWebGL(): boolean {
  if (typeof document === "undefined") return false;
  try {
    const canvas = document.createElement("canvas");
    const gl = (canvas.getContext("webgl2") ?? canvas.getContext("webgl")) as WebGLRenderingContext | null;
    if (!gl) return false;
    gl.getExtension("WEBGL_lose_context")?.loseContext();
    return true;
  } catch {
    return false;
  }
}

/** Asked once per mounted page; the answer does not change while it is open. */
export function useWebGL(): boolean {
  const [ok] = useState(canUseWebGL);
  return ok;
}
