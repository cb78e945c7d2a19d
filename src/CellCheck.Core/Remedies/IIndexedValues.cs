namespace CellCheck.Core.Remedies;

/// <summary>Values read by position (a span, or the response read on demand as <see cref="ShiftedValues"/>), so one
/// loop serves both without copying either.</summary>
internal interface IIndexedValues
{
    double this[int i] { get; }
}
