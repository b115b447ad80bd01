export { ATTACHMENT_TYPES, MAX_ATTACHMENT_BYTES, sniffAttachmentType, describeRefusedType, sanitiseFilename } from "./file-type";
export type { AttachmentType } from "./file-type";
export { inspectAttachment } from "./inspect";
export type { Inspection } from "./inspect";
