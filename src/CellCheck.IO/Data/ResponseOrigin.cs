namespace CellCheck.IO.Data;

/// <summary>
/// What a response's values are stored relative to: the column's first usable value taken exactly, and that value as a
/// plain scaled integer when it was written as a plain decimal (see <see cref="PlainDecimal"/>).
/// </summary>
internal readonly record struct ResponseOrigin(decimal Value, (long Mantissa, int Scale)? Plain);
