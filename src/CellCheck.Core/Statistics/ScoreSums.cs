namespace CellCheck.Core.Statistics;

/// <summary>One range's part of <see cref="FlignerKilleenScores"/>: each group's sum of scores, and the sum of all
/// scores and of their squares, with Neumaier's (1974) compensation, and the number of runs of ties.</summary>
internal sealed class ScoreSums
{
    private readonly NeumaierSum[] _groups;
    private NeumaierSum _sum;
    private NeumaierSum _squares;
    private int _runs;

    public ScoreSums(int groups) => _groups = new NeumaierSum[groups];

    /// <summary>Adds one value's score to its group's sum.</summary>
    public void Add(int group, double score) => _groups[group].Add(score);

    /// <summary>Adds a run of <paramref name="length"/> tied values, each scored <paramref name="score"/>, to the totals.</summary>
    public void AddRun(int length, double score)
    {
        _sum.Add(length * score);
        _squares.Add(length * score * score);
        _runs++;
    }

    /// <summary>The ranges' parts combined in order: Σ n_g (ā_g − ā)², Σ (a − ā)² = Σ a² − ā Σ a, and the runs.</summary>
    public static (double Between, double Total, int Runs) Table(ScoreSums[] ranges, GroupedValues part)
    {
        var n = part.Count;
        var sum = default(NeumaierSum);
        var squares = default(NeumaierSum);
        var runs = 0;
        foreach (var range in ranges)
        {
            sum.Add(range._sum.Value);
            squares.Add(range._squares.Value);
            runs += range._runs;
        }

        var mean = sum.Value / n;
        var between = default(NeumaierSum);
        for (var g = 0; g < part.GroupCount; g++)
        {
            var group = default(NeumaierSum);
            foreach (var range in ranges)
            {
                group.Add(range._groups[g].Value);
            }

            var size = part.Size(g);
            var deviation = (group.Value / size) - mean;
            between.Add(size * deviation * deviation);
        }

        return (between.Value, squares.Value - (mean * sum.Value), runs);
    }
}
