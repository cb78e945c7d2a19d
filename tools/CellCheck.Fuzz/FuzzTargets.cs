using CellCheck.IO;
using CellCheck.IO.Data;
using CellCheck.IO.Design;
using CellCheck.IO.Scaffold;

namespace CellCheck.Fuzz;

/// <summary>
/// The entry points under test. Each takes the fuzzer's bytes as one file, runs CellCheck's readers on it, and
/// returns a short signature of the outcome (the problem codes, or "ok"). Returned problems are the correct answer
/// to bad input; any exception escaping here is a crash.
/// </summary>
internal sealed class FuzzTargets : IDisposable
{
    public static readonly string[] Names = ["csv", "design", "check", "init", "xlsx"];

    /// <summary>Designs the csv, check and xlsx targets read their data file with: plain, with every option, regional.</summary>
    private static readonly string[] Designs =
    [
        "data: DATA\nfactors: [a, b]\nresponses: [y]\n",
        "data: DATA\nfactors: [{column: a, kind: numeric}]\nblocks: [b]\nresponses: [y, {column: z, unit: mm}]\nrun_order: run\nmodel: main\nmissing: [NA, \"-\"]\n",
        "data: DATA\ndelimiter: \";\"\ndecimal: \",\"\nthousands: \".\"\nfactors: [a]\nresponses: [y]\nwhere: {b: [x, y]}\nrun_order: file\n",
    ];

    private const string DesignData = "a,b,y,z,run\n1,x,1.5,2,1\n1,x,1.7,2.5,2\n2,y,2.5,3,3\n2,y,2.9,3.1,4\n1,y,1.1,0.4,5\n2,x,3.3,1,6\n";

    private readonly string _folder;
    private readonly Dictionary<string, DesignFile> _designs = new(StringComparer.Ordinal);

    public FuzzTargets()
    {
        _folder = Path.Combine(Path.GetTempPath(), "cellcheck-fuzz-" + Environment.ProcessId.ToString(System.Globalization.CultureInfo.InvariantCulture));
        Directory.CreateDirectory(_folder);
        for (var i = 0; i < Designs.Length; i++)
        {
            File.WriteAllText(DesignPath(i, "csv"), Designs[i].Replace("DATA", "data.csv", StringComparison.Ordinal));
            File.WriteAllText(DesignPath(i, "xlsx"), Designs[i].Replace("DATA", "data.xlsx", StringComparison.Ordinal));
        }

        File.WriteAllText(Path.Combine(_folder, "fixed.csv"), DesignData);
    }

    public string Run(string target, byte[] input) => target switch
    {
        "csv" => Data(input, "csv", analyze: false),
        "xlsx" => Data(input, "xlsx", analyze: false),
        "check" => Data(input, "csv", analyze: true),
        "design" => Design(input),
        "init" => Init(input),
        _ => throw new ArgumentException("unknown target " + target, nameof(target)),
    };

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string DesignPath(int variant, string kind) => Path.Combine(_folder, $"design{variant}-{kind}.yaml");

    private string Data(byte[] input, string kind, bool analyze)
    {
        File.WriteAllBytes(Path.Combine(_folder, "data." + kind), input);
        var signature = new List<string>();
        for (var i = 0; i < Designs.Length; i++)
        {
            var data = DataReader.Read(Design(DesignPath(i, kind)));
            signature.Add(Signature(data.Problems));
            if (analyze && data.Ok)
            {
                var run = CheckRun.Run(DesignPath(i, kind));
                signature.Add(string.Join('+', run.Value!.Report.Responses.Select(r => r.Verdict.Status.ToString())));
                ReportValues.Check(run.Value.Report);
                ReportValues.WriteAll(run.Value.Report);
            }
        }

        return string.Join('|', signature);
    }

    /// <summary>The harness's own design, read once, on first use: under SharpFuzz no instrumented code may run
    /// before the fuzzing loop starts (its coverage map does not exist yet).</summary>
    private DesignFile Design(string path)
    {
        if (!_designs.TryGetValue(path, out var design))
        {
            var read = DesignReader.Read(path);
            design = read.Ok ? read.Value! : throw new InvalidOperationException("The harness's own design file is refused: " + read.Problems[0].What);
            _designs[path] = design;
        }

        return design;
    }

    private string Design(byte[] input)
    {
        var path = Path.Combine(_folder, "fuzzed.yaml");
        File.WriteAllBytes(path, input);
        var design = DesignReader.Read(path);
        if (!design.Ok)
        {
            return Signature(design.Problems);
        }

        // Point the design at a fixed data file so that its options and columns are exercised too.
        var data = DataReader.Read(design.Value! with { DataPath = Path.Combine(_folder, "fixed.csv") });
        return "design-ok|" + Signature(data.Problems);
    }

    private string Init(byte[] input)
    {
        var data = Path.Combine(_folder, "init.csv");
        File.WriteAllBytes(data, input);
        var result = DesignScaffold.Inspect(data, Path.Combine(_folder, "init.yaml"));
        if (!result.Ok)
        {
            return Signature(result.Problems);
        }

        // The proposal must itself be a design file that CellCheck reads without crashing.
        var proposal = Path.Combine(_folder, "proposal.yaml");
        File.WriteAllText(proposal, DesignScaffold.Text(result.Value!));
        return "init-ok|" + Signature(DesignReader.Read(proposal).Problems);
    }

    private static string Signature(IReadOnlyList<Core.Problems.Problem> problems) =>
        problems.Count == 0 ? "ok" : string.Join(',', problems.Select(p => p.Code).Distinct());
}
