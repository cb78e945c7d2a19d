namespace CellCheck.Core.Tests.Properties;

/// <summary>Groups of values and the same groups after y = scale · x + shift (one shift and scale for all groups).</summary>
public sealed record Transformed(double[][] Groups, double Shift, double Scale)
{
    public double[][] Moved => [.. Groups.Select(g => g.Select(x => (Scale * x) + Shift).ToArray())];

    public override string ToString() =>
        $"shift {Shift:R}, scale {Scale:R}, groups [{string.Join("; ", Groups.Select(g => string.Join(", ", g.Select(x => x.ToString("R", System.Globalization.CultureInfo.InvariantCulture)))))}]";
}
