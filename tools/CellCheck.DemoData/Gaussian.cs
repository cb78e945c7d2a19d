namespace CellCheck.DemoData;

/// <summary>Seeded standard normal draws by the Box-Muller transform on System.Random (stable for a given seed).</summary>
internal sealed class Gaussian(int seed)
{
    private readonly Random _random = new(seed);
    private double? _spare;

    public double Next()
    {
        if (_spare is { } s)
        {
            _spare = null;
            return s;
        }

        var u1 = 1.0 - _random.NextDouble();
        var u2 = _random.NextDouble();
        var r = Math.Sqrt(-2.0 * Math.Log(u1));
        _spare = r * Math.Sin(2 * Math.PI * u2);
        return r * Math.Cos(2 * Math.PI * u2);
    }

    public void Shuffle<T>(T[] items) => _random.Shuffle(items);
}
