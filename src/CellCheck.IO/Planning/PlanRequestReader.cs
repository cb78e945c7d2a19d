using System.Globalization;
using CellCheck.Core.Calibration;
using CellCheck.Core.Planning;
using CellCheck.Core.Problems;

namespace CellCheck.IO.Planning;

/// <summary>Checks the plan command's options and turns them into a <see cref="PlanRequest"/>, or located problems.</summary>
public static class PlanRequestReader
{
    /// <summary>Where option problems are located.</summary>
    public const string CommandLine = "command line";

    /// <summary>Fewest simulated data sets per size accepted for the checks' replicates.</summary>
    public const int MinimumDraws = 20;

    public static LoadResult<PlanRequest> Read(PlanArguments args, double designAlpha)
    {
        ArgumentNullException.ThrowIfNull(args);
        var problems = new List<Problem>();
        var effect = ParseEffect(args.Effect, problems);
        if (args.Sd is { } sd && !(sd > 0 && double.IsFinite(sd)))
        {
            problems.Add(Option(ProblemCodes.PlanBadSd, "--sd", $"--sd {Text(sd)} is not a positive number.",
                "Give the within-cell standard deviation in the response's unit, or leave --sd out to take it from the data."));
        }

        var alpha = args.Alpha ?? designAlpha;
        if (!(alpha > 0 && alpha <= 0.5))
        {
            problems.Add(Option(ProblemCodes.PlanBadAlpha, "--alpha", $"--alpha {Text(alpha)} is outside (0, 0.5].", "Give a level such as 0.05."));
        }

        var checkPower = args.CheckPower ?? args.Power;
        foreach (var (name, value) in new[] { ("--power", args.Power), ("--check-power", checkPower) })
        {
            if (!(value > alpha && value < 1))
            {
                problems.Add(Option(ProblemCodes.PlanBadPower, name, $"{name} {Text(value)} is not between alpha and 1.", "Give a target such as 0.8 or 0.9."));
            }
        }

        if (args.Draws < MinimumDraws)
        {
            problems.Add(Option(ProblemCodes.PlanBadDraws, "--draws", $"--draws {args.Draws} is below {MinimumDraws}.",
                $"Give at least {MinimumDraws} simulated data sets per size (200 by default; more gives steadier answers)."));
        }

        if (problems.Count > 0)
        {
            return LoadResult<PlanRequest>.Failure(problems);
        }

        var seed = CalibrationSettings.Default.Seed + ReplicatesAssessor.SeedOffset;
        return LoadResult<PlanRequest>.Success(new PlanRequest(effect!, args.Sd, alpha, args.Power, checkPower, args.Draws, seed));
    }

    private static SmallestEffect? ParseEffect(string? text, List<Problem> problems)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            problems.Add(Option(ProblemCodes.PlanMissingEffect, "--effect", "No smallest effect of interest was given: power depends on it.",
                "Add --effect 0.5 (the smallest difference between means worth detecting, in the response's unit) or --effect f=0.25 (Cohen's f)."));
            return null;
        }

        var t = text.Trim();
        var cohen = t.StartsWith("f=", StringComparison.OrdinalIgnoreCase);
        var number = cohen ? t[2..] : t;
        if (double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && value > 0 && double.IsFinite(value))
        {
            return cohen ? SmallestEffect.CohenF(value) : SmallestEffect.Difference(value);
        }

        problems.Add(Option(ProblemCodes.PlanBadEffect, "--effect", $"--effect '{text}' is not a positive number or f=NUMBER.",
            "Write the smallest difference between means worth detecting (--effect 0.5) or Cohen's f (--effect f=0.25)."));
        return null;
    }

    private static Problem Option(string code, string option, string what, string fix) =>
        new(code, CommandLine + " (" + option + ")", null, null, what, fix);

    private static string Text(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
