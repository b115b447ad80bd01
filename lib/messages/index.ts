export { plainIssues, problemWords, labelFor, humanize, machinePath, isLibraryWording } from "./plain-issues";
export type { PlainIssue, LabelResolver, PathKey } from "./plain-issues";
export { labelsForSubject, designLabels, partLabels, partSpecsLabel, pathKeys, problemLabel } from "./labels";
