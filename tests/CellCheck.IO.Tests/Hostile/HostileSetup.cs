using CellCheck.Core.Problems;
using CellCheck.IO.Data;
using CellCheck.IO.Design;
using CellCheck.IO.Html;
using CellCheck.IO.Reports;

namespace CellCheck.IO.Tests.Hostile;

/// <summary>
/// Puts a hostile case in a fresh folder (the file as the data file of a fixed design, or as the design file beside
/// fixed data) and runs it as far as the case says, returning the problems or, when there are none, the line of the
/// last row read. Any exception escapes: that is the crash these tests exist to catch.
/// </summary>
internal sealed class HostileSetup : IDisposable
{
    /// <summary>The designs data files are read with, by name (the fuzz harness uses the same three).</summary>
    public static readonly IReadOnlyDictionary<string, string> Designs = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["plain"] = "data: DATA\nfactors: [a, b]\nresponses: [y]\n",
        ["full"] = "data: DATA\nfactors: [{column: a, kind: numeric}]\nblocks: [b]\nresponses: [y, {column: z, unit: mm}]\nrun_order: run\nmodel: main\nmissing: [NA, \"-\"]\n",
        ["regional"] = "data: DATA\ndelimiter: \";\"\ndecimal: \",\"\nthousands: \".\"\nfactors: [a]\nresponses: [y]\nwhere: {b: [x, y]}\nrun_order: file\n",
    };

    private const string FixedData = "a,b,y,z,run\n1,x,1.5,2,1\n1,x,1.7,2.5,2\n2,y,2.5,3,3\n2,y,2.9,3.1,4\n1,y,1.1,0.4,5\n2,x,3.3,1,6\n";

    public HostileSetup(string source, string design)
    {
        Folder = Path.Combine(Path.GetTempPath(), "cellcheck-hostile-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
        if (design == "-")
        {
            DesignPath = Path.Combine(Folder, "design.yaml");
            File.Copy(source, DesignPath);
            File.WriteAllText(Path.Combine(Folder, "data.csv"), FixedData);
        }
        else
        {
            var data = "data" + Path.GetExtension(source);
            File.Copy(source, Path.Combine(Folder, data));
            DesignPath = Path.Combine(Folder, "design.yaml");
            File.WriteAllText(DesignPath, Designs[design].Replace("DATA", data, StringComparison.Ordinal));
        }
    }

    public string Folder { get; }

    public string DesignPath { get; }

    /// <summary>Reads (and with <paramref name="check"/> analyses and writes every report); problems, or the last row's line.</summary>
    public (IReadOnlyList<Problem> Problems, int? LastLine) Run(bool check)
    {
        var design = DesignReader.Read(DesignPath);
        if (!design.Ok)
        {
            return (design.Problems, null);
        }

        var data = DataReader.Read(design.Value!);
        if (!data.Ok)
        {
            return (data.Problems, null);
        }

        if (check)
        {
            var run = CheckRun.Run(DesignPath);
            Assert.True(run.Ok);
            ReportInvariants.Check(run.Value!.Report);
            using var json = new MemoryStream();
            JsonReportWriter.Write(run.Value.Report, json, "test");
            using var csv = new MemoryStream();
            DiagnosticsCsvWriter.Write(run.Value.Report, csv);
            using var text = new StringWriter();
            TerminalReportWriter.Write(run.Value.Report, text, "test");
            Assert.NotEmpty(HtmlReportWriter.Render(run.Value.Report, new HtmlContext("0", DateTimeOffset.UnixEpoch, "test")));
        }

        return ([], data.Value!.SourceLines.Length == 0 ? null : data.Value.SourceLines[^1]);
    }

    public void Dispose() => Directory.Delete(Folder, recursive: true);
}
