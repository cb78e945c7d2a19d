using MathNet.Numerics.LinearAlgebra;

namespace CellCheck.Core.Calibration;

/// <summary>
/// The null plan of a general linear model (blocks, main effects, numeric terms): residuals e = y − Q Q'y with Q the
/// thin orthonormal factor of the full-rank design matrix, leverage h_i = Σ_j Q_ij², studentized e_i / (s √(1 − h_i)).
/// </summary>
public sealed class ModelPlan : INullPlan
{
    private const double LeverageOne = 1e-10;
    private readonly Matrix<double> _q;
    private readonly double[] _scale;

    /// <summary>Creates the plan from the full-rank design matrix (rows in the partition's grouped order) and cell boundaries.</summary>
    public ModelPlan(double[,] estimableDesign, int[] cellStarts, string key)
    {
        ArgumentNullException.ThrowIfNull(estimableDesign);
        ArgumentNullException.ThrowIfNull(cellStarts);
        _q = Matrix<double>.Build.DenseOfArray(estimableDesign).QR(MathNet.Numerics.LinearAlgebra.Factorization.QRMethod.Thin).Q;
        Rows = estimableDesign.GetLength(0);
        CellStarts = cellStarts;
        Key = key;
        _scale = new double[Rows];
        var usable = 0;
        for (var i = 0; i < Rows; i++)
        {
            var h = _q.Row(i).DotProduct(_q.Row(i));
            _scale[i] = 1.0 - h > LeverageOne ? Math.Sqrt(1.0 - h) : double.NaN;
            usable += double.IsNaN(_scale[i]) ? 0 : 1;
        }

        UsableResiduals = usable;
        Shape = new DesignShape(Enumerable.Range(0, cellStarts.Length - 1).Select(c => cellStarts[c + 1] - cellStarts[c]));
        ResidualDf = Rows - _q.ColumnCount;
    }

    public string Key { get; }

    public DesignShape Shape { get; }

    public int Rows { get; }

    public int UsableResiduals { get; }

    public int ResidualDf { get; }

    public int[] CellStarts { get; }

    public void Residualize(ReadOnlySpan<double> y, Span<double> residuals, Span<double> studentized)
    {
        var v = Vector<double>.Build.DenseOfArray(y.ToArray());
        var fitted = _q * (_q.TransposeThisAndMultiply(v));
        var ss = 0.0;
        for (var i = 0; i < Rows; i++)
        {
            residuals[i] = y[i] - fitted[i];
            ss += residuals[i] * residuals[i];
        }

        var s = Math.Sqrt(ss / ResidualDf);
        for (var i = 0; i < Rows; i++)
        {
            studentized[i] = residuals[i] / (s * _scale[i]);
        }
    }
}
