// Runs once when a server process starts (Next.js instrumentation hook).
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { installClientAddressHook } = await import("./lib/http/client-address-hook");
    installClientAddressHook();
  }
}
