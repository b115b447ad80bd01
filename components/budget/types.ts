import type { BuildEvaluation } from "@/lib/retrofit";

export type Evaluation = BuildEvaluation;
export type Scenario = BuildEvaluation["scenarios"][number];
export type Limit = NonNullable<Scenario["thermal"]>["limits"][number];
