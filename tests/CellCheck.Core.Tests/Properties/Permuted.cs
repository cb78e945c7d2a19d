namespace CellCheck.Core.Tests.Properties;

/// <summary>Groups of values and the same groups with the rows of each group in another order.</summary>
public sealed record Permuted(double[][] Groups, double[][] Shuffled)
{
    public override string ToString() => "groups [" + string.Join("; ", Groups.Select(g => string.Join(", ", g))) + "]";
}
