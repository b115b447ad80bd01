/**
 * Something worth a second look that is not an error: the part is saved as entered and the
 * note is shown beside the field (fins thicker than their gaps, a charge window below 0 °C).
 */
export interface PartNote {
  /** Field key inside the specs, e.g. "finThicknessM". */
  readonly field: string;
  readonly message: string;
}
