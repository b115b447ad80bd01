/** Runs once when a server process starts (Next.js calls it before serving requests). */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { installFrontDoor } = await import("@/server/http/front-door");
    installFrontDoor();
  }
}
