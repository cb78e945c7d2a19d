namespace CellCheck.Core.Plots;

/// <summary>
/// Settings of the pictures: the envelope seed and number of simulated samples, the smallest cell drawn as a QQ plot
/// (smaller cells are a dot strip), and the most panels one cell grid shows.
/// </summary>
public sealed record PlotOptions(int Seed = PlotOptions.DefaultSeed, int Draws = QqEnvelopes.DefaultDraws, int MinQq = 5, int MaxPanels = 48)
{
    /// <summary>The envelope seed unless one is given.</summary>
    public const int DefaultSeed = 1958;

    /// <summary>The defaults.</summary>
    public static PlotOptions Default { get; } = new();
}
