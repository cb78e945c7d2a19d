namespace CellCheck.Core.Models;

/// <summary>Takes the residuals of a projection one unit at a time, in unit order (see
/// <see cref="CellBlockFit.Residualize{TValues, TSink}(TValues, ref TSink)"/>).</summary>
internal interface IResidualSink
{
    void Put(int unit, double residual);
}
