using System.Globalization;
using CellCheck.Core.Tests.Support;
using MathNet.Numerics.LinearAlgebra;

namespace CellCheck.Core.Tests.Order;

/// <summary>Fixture columns, least-squares residuals and small designs for the run-order tests.</summary>
internal static class OrderFixtures
{
    /// <summary>The numeric column <paramref name="name"/> of a comma-separated fixture with a header row, in file order.</summary>
    public static double[] Column(string file, string name)
    {
        var lines = File.ReadAllLines(Fixture.Path(file)).Where(l => l.Length > 0).ToArray();
        var index = Array.IndexOf(lines[0].Split(','), name);
        Assert.True(index >= 0, $"column {name} missing in {file}");
        return lines.Skip(1).Select(l => double.Parse(l.Split(',')[index], CultureInfo.InvariantCulture)).ToArray();
    }

    /// <summary>Growth of money (Krämer &amp; Sonnberger 1986, Table 6.7): design [1, AG0.TG0] and response TG1.TG0.</summary>
    public static (double[,] X, double[] Y) GrowthOfMoney()
    {
        var x = Column("growth-of-money.csv", "AG0.TG0");
        return (WithIntercept(x), Column("growth-of-money.csv", "TG1.TG0"));
    }

    /// <summary>An n × 2 design: a column of ones and <paramref name="x"/>.</summary>
    public static double[,] WithIntercept(double[] x)
    {
        var design = new double[x.Length, 2];
        for (var i = 0; i < x.Length; i++)
        {
            design[i, 0] = 1;
            design[i, 1] = x[i];
        }

        return design;
    }

    /// <summary>Least-squares residuals y − Xβ̂ (MathNet Householder QR solve).</summary>
    public static double[] Residuals(double[,] x, double[] y)
    {
        var xm = Matrix<double>.Build.DenseOfArray(x);
        var yv = Vector<double>.Build.DenseOfArray(y);
        return (yv - (xm * xm.QR().Solve(yv))).ToArray();
    }

    /// <summary>The 2⁴ factorial in 16 runs, columns 1, A, B, C, D (±1), rows in a fixed scrambled run order
    /// (standard order 0..15 permuted by r ↦ 7r + 3 mod 16, so no factor follows the run sequence).</summary>
    public static double[,] Factorial16()
    {
        var x = new double[16, 5];
        for (var run = 0; run < 16; run++)
        {
            var standard = ((7 * run) + 3) % 16;
            x[run, 0] = 1;
            for (var f = 0; f < 4; f++)
            {
                x[run, f + 1] = ((standard >> f) & 1) == 1 ? 1 : -1;
            }
        }

        return x;
    }
}
