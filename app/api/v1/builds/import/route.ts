import { createBuild } from "@/db/queries/builds";
import { buildFileSchema, inlineFileParts } from "@/lib/builds/export-format";
import { fromZodError, ApiError } from "@/lib/http/api-error";
import { buildDesignSchema } from "@/lib/retrofit";
import { requireUser } from "@/server/auth/session";
import { json, readJson, route } from "@/server/route";

/** Imports a Sinkwise build file as a new private build; its parts become inline slots. */
export const POST = route(async (request) => {
  const user = await requireUser();
  const file = await readJson(request, buildFileSchema, "build_file");
  const { design, missing } = inlineFileParts(file);
  if (missing.length) {
    throw new ApiError("bad_request:build_file", `The file refers to parts it does not carry: ${missing.join(", ")}.`, "parts");
  }
  const parsed = buildDesignSchema.safeParse(design);
  if (!parsed.success) {
    const e = fromZodError(parsed.error, "build_file");
    throw new ApiError("bad_request:build_file", `design.${e.message}`, `design.${e.path}`);
  }
  const created = await createBuild({
    ownerId: user.id,
    title: file.build.title,
    summary: file.build.summary,
    visibility: "private",
    design: parsed.data,
    partIds: [],
    note: `Imported from a build file${file.build.revision ? ` (revision ${file.build.revision})` : ""}`,
  });
  return json({ build: created }, 201);
});
