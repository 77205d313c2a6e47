/**
 * Thrown for any input the computation cannot use: NaN, infinities, zero or negative sizes,
 * unknown labels, lot sizes below 2, AQLs the tables do not hold. `field` names the
 * offending input so a form can put the message beside it.
 */
export class StandardsInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'StandardsInputError';
    this.field = field;
  }
}
