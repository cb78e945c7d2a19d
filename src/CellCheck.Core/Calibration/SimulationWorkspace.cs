namespace CellCheck.Core.Calibration;

/// <summary>One thread's buffers for simulating a plan: the response, residuals, studentized residuals and an evaluator.</summary>
internal sealed class SimulationWorkspace(INullPlan plan, PrimaryChoice choice)
{
    public double[] Values { get; } = new double[plan.Rows];

    public double[] Residuals { get; } = new double[plan.Rows];

    public double[] Studentized { get; } = new double[plan.Rows];

    public PrimaryEvaluator Evaluator { get; } = new(choice, plan.CellStarts);
}
