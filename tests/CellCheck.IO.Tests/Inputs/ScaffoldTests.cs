using CellCheck.IO.Scaffold;

namespace CellCheck.IO.Tests.Inputs;

public sealed class ScaffoldTests
{
    [Fact]
    public void Init_proposes_the_roles_of_the_demo_columns_and_its_output_runs()
    {
        var root = new DirectoryInfo(AppContext.BaseDirectory);
        while (!File.Exists(Path.Combine(root.FullName, "CellCheck.sln")))
        {
            root = root.Parent!;
        }

        using var t = new TempDesign(File.ReadAllText(Path.Combine(root.FullName, "designs", "field-trial.csv")), dataName: "trial.csv");
        var design = Path.Combine(t.Folder, "proposed.yaml");
        var result = DesignScaffold.Inspect(Path.Combine(t.Folder, "trial.csv"), design);
        var roles = result.Value!.Columns.ToDictionary(c => c.Name, c => c.Role);
        Assert.Equal(ColumnRole.RunOrder, roles["plot"]);
        Assert.Equal(ColumnRole.Block, roles["block"]);
        Assert.Equal(ColumnRole.Factor, roles["nitrogen"]);
        Assert.Equal(ColumnRole.Factor, roles["variety"]);
        Assert.Equal(ColumnRole.Response, roles["yield"]);
        Assert.Null(DesignScaffold.Write(result.Value, design));
        var run = CheckRun.Run(design);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        Assert.Equal(ProblemCodes.OutputExists, DesignScaffold.Write(result.Value, design)!.Code);
    }
}
