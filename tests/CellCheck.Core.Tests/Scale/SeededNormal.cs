namespace CellCheck.Core.Tests.Scale;

/// <summary>Seeded standard normal draws by the Box-Muller transform (Box &amp; Muller 1958) on a given System.Random.</summary>
internal sealed class SeededNormal(Random random)
{
    private double _spare = double.NaN;

    public double Next()
    {
        if (!double.IsNaN(_spare))
        {
            var spare = _spare;
            _spare = double.NaN;
            return spare;
        }

        var u1 = 1.0 - random.NextDouble();
        var u2 = random.NextDouble();
        var r = Math.Sqrt(-2.0 * Math.Log(u1));
        _spare = r * Math.Sin(2 * Math.PI * u2);
        return r * Math.Cos(2 * Math.PI * u2);
    }
}
