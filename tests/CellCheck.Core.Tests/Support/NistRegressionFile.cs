using System.Globalization;
using System.Text.RegularExpressions;

namespace CellCheck.Core.Tests.Support;

/// <summary>
/// Reads a NIST StRD linear regression file as laid out in Fixtures/nist-strd: the header's "Data (lines A to B)"
/// entry gives the data lines, each holding y first and then the predictors; the certified block holds one line
/// "Bk  estimate  standard deviation" per parameter and a line "Standard Deviation  value" for the residual SD.
/// </summary>
internal sealed partial class NistRegressionFile
{
    private NistRegressionFile(double[] y, double[][] predictors, double[] estimates, double[] deviations, double residualSd)
    {
        Y = y;
        Predictors = predictors;
        CertifiedEstimates = estimates;
        CertifiedDeviations = deviations;
        CertifiedResidualSd = residualSd;
    }

    /// <summary>The response, each value parsed directly as double.</summary>
    public double[] Y { get; }

    /// <summary>Predictors[j][i]: predictor j of observation i, as in the file (x1, x2, ...).</summary>
    public double[][] Predictors { get; }

    /// <summary>Certified parameter estimates B0, B1, ... (B1 first for the no-intercept files).</summary>
    public double[] CertifiedEstimates { get; }

    /// <summary>Certified standard deviations of the estimates, in the same order.</summary>
    public double[] CertifiedDeviations { get; }

    public double CertifiedResidualSd { get; }

    public static NistRegressionFile Load(string name)
    {
        var lines = File.ReadAllLines(Fixture.Path(Path.Combine("nist-strd", name + ".dat")));
        var (certFirst, certLast) = Range(lines, CertifiedLines());
        var (dataFirst, dataLast) = Range(lines, DataLines());
        var certified = lines[(certFirst - 1)..certLast];
        var parameters = certified.Select(l => ParameterLine().Match(l)).Where(m => m.Success).ToArray();
        var residualSd = certified.Select(l => ResidualSdLine().Match(l)).Single(m => m.Success);
        var rows = lines[(dataFirst - 1)..dataLast]
            .Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(Parse).ToArray())
            .ToArray();
        var width = rows[0].Length;
        Assert.All(rows, r => Assert.Equal(width, r.Length));
        return new NistRegressionFile(
            rows.Select(r => r[0]).ToArray(),
            Enumerable.Range(1, width - 1).Select(j => rows.Select(r => r[j]).ToArray()).ToArray(),
            parameters.Select(m => Parse(m.Groups[1].Value)).ToArray(),
            parameters.Select(m => Parse(m.Groups[2].Value)).ToArray(),
            Parse(residualSd.Groups[1].Value));
    }

    /// <summary>The design 1, x, x², ..., x^degree (without the leading 1 when <paramref name="intercept"/> is false)
    /// for the file's single predictor; powers by repeated multiplication in double.</summary>
    public double[,] Polynomial(int degree, bool intercept = true)
    {
        var x = Predictors.Single();
        var first = intercept ? 0 : 1;
        var design = new double[x.Length, degree + 1 - first];
        for (var i = 0; i < x.Length; i++)
        {
            var power = 1.0;
            for (var k = 0; k <= degree; k++)
            {
                if (k >= first)
                {
                    design[i, k - first] = power;
                }

                power *= x[i];
            }
        }

        return design;
    }

    /// <summary>The design 1, x1, ..., xp from the file's predictors.</summary>
    public double[,] InterceptAndPredictors()
    {
        var n = Y.Length;
        var design = new double[n, Predictors.Length + 1];
        for (var i = 0; i < n; i++)
        {
            design[i, 0] = 1;
            for (var j = 0; j < Predictors.Length; j++)
            {
                design[i, j + 1] = Predictors[j][i];
            }
        }

        return design;
    }

    private static double Parse(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static (int First, int Last) Range(string[] lines, Regex pattern)
    {
        var m = lines.Select(l => pattern.Match(l)).First(m => m.Success);
        return (int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture), int.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture));
    }

    [GeneratedRegex(@"Certified Values\s+\(lines\s+(\d+)\s+to\s+(\d+)\)")]
    private static partial Regex CertifiedLines();

    [GeneratedRegex(@"Data\s+\(lines\s+(\d+)\s+to\s+(\d+)\)")]
    private static partial Regex DataLines();

    [GeneratedRegex(@"^\s*B\d+\s+(\S+)\s+(\S+)\s*$")]
    private static partial Regex ParameterLine();

    [GeneratedRegex(@"^\s*Standard Deviation\s+(\S+)\s*$")]
    private static partial Regex ResidualSdLine();
}
