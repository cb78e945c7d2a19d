using CellCheck.Core.Analysis;
using CellCheck.Core.Remedies;
using CellCheck.Core.Statistics;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO;

/// <summary>Reads a design and its data and runs every check: the whole job between the files and the reports.</summary>
public static class CheckRun
{
    /// <summary>Runs the checks. <paramref name="adjust"/> and <paramref name="alpha"/> override the design file when given;
    /// <paramref name="transform"/> re-runs every check on a transformed response (transformation advice is always given);
    /// <paramref name="sensitivityDraws"/> sets the simulated data sets per scenario of the checks' sensitivity table.</summary>
    public static LoadResult<CheckRunResult> Run(string designPath, AdjustMethod? adjust = null, double? alpha = null, TransformRequest? transform = null,
        int? sensitivityDraws = null)
    {
        var design = DesignReader.Read(designPath);
        if (!design.Ok)
        {
            return LoadResult<CheckRunResult>.Failure(design.Problems);
        }

        var file = design.Value!;
        var data = DataReader.Read(file);
        if (!data.Ok)
        {
            return LoadResult<CheckRunResult>.Failure(data.Problems);
        }

        var options = new AnalysisOptions(alpha ?? file.Alpha, adjust ?? file.Adjust);
        options = sensitivityDraws is { } draws ? options with { SensitivityDraws = draws } : options;
        var spec = ModelSpecs.From(file);
        var analyzed = DesignAnalyzer.Analyze(data.Value!, options, spec, file.AdjustAcross == AdjustAcross.CellsAndResponses);
        var responses = analyzed.Select((report, r) => report with { Remedy = RemedyAnalyzer.Analyze(data.Value!, r, options, spec, report, transform) }).ToList();

        var summary = new DesignSummary(designPath, file.DataText, file.Name, file.Factors.Select(f => f.Name).ToArray(),
            file.RunOrder?.Column, options.Alpha, AdjustName(options.Adjust))
        {
            Blocks = file.Blocks.Select(b => b.Name).ToArray(),
            AdjustAcross = file.AdjustAcross == AdjustAcross.CellsAndResponses ? "cells-and-responses" : "cells",
            FilteredOut = data.Value!.FilteredOut,
        };
        return LoadResult<CheckRunResult>.Success(new CheckRunResult(file, new CheckReport(summary, responses)));
    }

    public static string AdjustName(AdjustMethod method) => method switch
    {
        AdjustMethod.Holm => "holm",
        AdjustMethod.BenjaminiHochberg => "bh",
        _ => "none",
    };
}
