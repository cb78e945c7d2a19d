using CellCheck.Core.Calibration;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>One thread's buffers for simulating the single checks of a plan.</summary>
internal sealed class SensitivityWorkspace(INullPlan plan, double alpha, AdjustMethod adjust)
{
    public double[] Values { get; } = new double[plan.Rows];

    public double[] Residuals { get; } = new double[plan.Rows];

    public double[] Studentized { get; } = new double[plan.Rows];

    public SensitivityEvaluator Evaluator { get; } = new(plan.CellStarts, alpha, adjust);
}
