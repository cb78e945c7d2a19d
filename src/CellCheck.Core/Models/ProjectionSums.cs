namespace CellCheck.Core.Models;

/// <summary>Takes the projected squared fits z of Tukey's test one at a time and keeps eᵀz and zᵀz, added in unit order.</summary>
internal struct ProjectionSums(double[] residuals) : IResidualSink
{
    public double Ez { get; private set; }

    public double Zz { get; private set; }

    public void Put(int unit, double residual)
    {
        Ez += residuals[unit] * residual;
        Zz += residual * residual;
    }
}
