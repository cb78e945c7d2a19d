namespace CellCheck.Core.Models;

/// <summary>Writes each residual at its unit's place in a span.</summary>
internal readonly ref struct SpanSink(Span<double> target) : IResidualSink
{
    private readonly Span<double> _target = target;

    public void Put(int unit, double residual) => _target[unit] = residual;
}
