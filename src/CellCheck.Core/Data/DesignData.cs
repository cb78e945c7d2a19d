namespace CellCheck.Core.Data;

/// <summary>
/// The data of one design, columnar: factors, responses, the data-file line of every row, and the rows excluded
/// per response (a row whose factor value is missing is excluded for every response).
/// </summary>
public sealed class DesignData
{
    public DesignData(
        IReadOnlyList<FactorColumn> factors,
        IReadOnlyList<ResponseColumn> responses,
        int[] sourceLines,
        IReadOnlyList<IReadOnlyList<ExcludedRow>> excluded,
        IReadOnlyList<FactorColumn>? blocks = null)
        : this(factors, responses, LineNumbers.From(sourceLines ?? throw new ArgumentNullException(nameof(sourceLines))), excluded, blocks)
    {
    }

    public DesignData(
        IReadOnlyList<FactorColumn> factors,
        IReadOnlyList<ResponseColumn> responses,
        LineNumbers sourceLines,
        IReadOnlyList<IReadOnlyList<ExcludedRow>> excluded,
        IReadOnlyList<FactorColumn>? blocks = null)
    {
        ArgumentNullException.ThrowIfNull(factors);
        ArgumentNullException.ThrowIfNull(responses);
        ArgumentNullException.ThrowIfNull(sourceLines);
        ArgumentNullException.ThrowIfNull(excluded);
        if (excluded.Count != responses.Count)
        {
            throw new ArgumentException("one exclusion list per response is required", nameof(excluded));
        }

        blocks ??= [];
        foreach (var f in factors.Concat(blocks))
        {
            if (f.Codes.Length != sourceLines.Length)
            {
                throw new ArgumentException($"factor {f.Name} has {f.Codes.Length} rows, expected {sourceLines.Length}", nameof(factors));
            }
        }

        foreach (var r in responses)
        {
            if (r.Length != sourceLines.Length)
            {
                throw new ArgumentException($"response {r.Name} has {r.Length} rows, expected {sourceLines.Length}", nameof(responses));
            }
        }

        Factors = factors;
        Blocks = blocks;
        Responses = responses;
        SourceLines = sourceLines;
        Excluded = excluded;
    }

    public IReadOnlyList<FactorColumn> Factors { get; }

    /// <summary>Nuisance factors: they enter the model additively and do not define cells.</summary>
    public IReadOnlyList<FactorColumn> Blocks { get; }

    public IReadOnlyList<ResponseColumn> Responses { get; }

    /// <summary>Line in the data file of each row (1-based, the header is line 1 for a plain file).</summary>
    public LineNumbers SourceLines { get; }

    /// <summary>Rows excluded for each response, in the order of <see cref="Responses"/>.</summary>
    public IReadOnlyList<IReadOnlyList<ExcludedRow>> Excluded { get; }

    public int RowCount => SourceLines.Length;

    /// <summary>Run position (or time in seconds) of each row, NaN where missing; null when no run order was declared.</summary>
    public RunPositions? RunOrder { get; init; }

    /// <summary>Rows left out by the design's row filter (not errors; counted in the report).</summary>
    public int FilteredOut { get; init; }

    /// <summary>The run-order column ("file" when the file order is the run order); null when none was declared.</summary>
    public string? RunOrderColumn { get; init; }
}
