using CellCheck.Core.Analysis;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Built once for all the tests of <see cref="MillionRowAgreementTests"/>: the seeded 1 000 000-row, 1 000-cell design
/// (<see cref="ScaleDesign.ThousandCells"/>), CellCheck's report on it with default options, and the reference cells.
/// </summary>
public sealed class MillionRowFixture
{
    public MillionRowFixture()
    {
        Design = ScaleDesign.ThousandCells();
        Report = ResponseAnalyzer.Analyze(Design.Data, 0, new AnalysisOptions());
        Reference = ReferenceCells.From(Design);
    }

    internal ScaleDesign Design { get; }

    internal ResponseReport Report { get; }

    internal ReferenceCells Reference { get; }
}
