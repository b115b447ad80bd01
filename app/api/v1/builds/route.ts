import { createBuild, listBuilds } from "@/db/queries/builds";
import { createBuildSchema } from "@/lib/builds/api-schemas";
import { requireUser } from "@/server/auth/session";
import { assertDesignParts } from "@/server/builds/load";
import { json, readJson, route } from "@/server/route";

export const GET = route(async (request) => {
  const user = await requireUser();
  const q = new URL(request.url).searchParams.get("q")?.trim().slice(0, 160) || undefined;
  return json(await listBuilds({ viewer: user, q }));
});

export const POST = route(async (request) => {
  const user = await requireUser();
  const input = await readJson(request, createBuildSchema, "build");
  const partIds = await assertDesignParts({ design: input.design, viewer: user });
  const created = await createBuild({ ownerId: user.id, ...input, partIds });
  return json({ build: created }, 201);
});
