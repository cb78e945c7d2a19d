using CellCheck.Core.Problems;
using CellCheck.IO.Design;

namespace CellCheck.IO.Data;

/// <summary>Checks that every level of a factor declared <c>kind: numeric</c> is a number.</summary>
internal static class NumericLevels
{
    public static List<Problem> Check(DesignFile design, LevelInterner[] factors, NumberSyntax syntax)
    {
        var problems = new List<Problem>();
        for (var f = 0; f < design.Factors.Count; f++)
        {
            var spec = design.Factors[f];
            if (spec.Kind == FactorKind.Numeric && factors[f].FirstNonNumeric(syntax) is { } label)
            {
                problems.Add(new Problem(ProblemCodes.NonNumericLevel, design.Path, spec.Mark.Line, spec.Mark.Column,
                    $"The factor '{spec.Name}' is declared numeric but its column holds '{(label.Length > 40 ? label[..37] + "..." : label)}', which is not a finite number between 1e-100 and 1e100 in magnitude (or 0).",
                    "Correct the value in the data file, or declare the factor kind: categorical."));
            }
        }

        return problems;
    }
}
