namespace CellCheck.Core.Calibration;

/// <summary>
/// What the simulation of the primary statistics under the null needs to know about a design: its rows grouped by
/// cell, which cells hold two or more rows, and how the fitted model turns responses into residuals and internally
/// studentized residuals. Every primary statistic is unchanged by the model's fitted part and by a common change of
/// scale, so under normal errors with equal spread its distribution depends on nothing else.
/// </summary>
public interface INullPlan
{
    /// <summary>Identity of the plan for caching: equal keys mean equal null distributions.</summary>
    string Key { get; }

    /// <summary>The sizes of the replicated cells, from which the primary rules choose.</summary>
    DesignShape Shape { get; }

    /// <summary>Number of rows simulated.</summary>
    int Rows { get; }

    /// <summary>Number of residuals with a studentized value (leverage below one).</summary>
    int UsableResiduals { get; }

    /// <summary>Cell boundaries over the rows: cell c is rows [CellStarts[c], CellStarts[c + 1]).</summary>
    int[] CellStarts { get; }

    /// <summary>Residuals and internally studentized residuals (NaN where leverage is one) of response <paramref name="y"/>.</summary>
    void Residualize(ReadOnlySpan<double> y, Span<double> residuals, Span<double> studentized);
}
