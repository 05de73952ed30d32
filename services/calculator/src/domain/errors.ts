/**
 * The spec is valid input but no rack can be built from it (HTTP: 422).
 * `field` names the request field to change, in the dotted form of validation errors.
 */
export class UnbuildableSpecError extends Error {
  readonly code = 'unbuildable_spec';
  constructor(
    readonly reason: string,
    readonly field: string,
  ) {
    super(reason);
    this.name = 'UnbuildableSpecError';
  }
}
