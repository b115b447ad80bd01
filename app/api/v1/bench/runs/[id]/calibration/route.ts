import { calibrationRequestSchema } from "@/lib/bench/run-schema";
import { requireUser } from "@/server/auth/session";
import { calibrationForRun, calibrationJson, saveCalibration } from "@/server/bench/calibrate";
import { loadBenchRun } from "@/server/bench/load";
import { json, readJson, route } from "@/server/route";

/**
 * Calibrates the build a warm-up was recorded of: the factor on its least certain figure
 * that brings the predicted warm-up closest to the readings. With `save`, a new revision.
 * The run must be visible to the caller and the build editable by them.
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const run = await loadBenchRun({ id: (await params).id, viewer: user });
  const input = await readJson(request, calibrationRequestSchema, "calibration");
  if (!input.save) {
    const { result } = await calibrationForRun({ run, viewer: user });
    return json({ calibration: calibrationJson(result) });
  }
  const saved = await saveCalibration({ run, viewer: user });
  return json({ calibration: calibrationJson(saved.result), revision: { number: saved.revision, url: `/builds/${saved.buildId}/budget` } }, 201);
});
