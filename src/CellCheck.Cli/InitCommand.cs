using System.CommandLine;
using CellCheck.IO.Scaffold;

namespace CellCheck.Cli;

/// <summary>The <c>init</c> command: inspects a data file and writes a commented design file proposal.</summary>
internal static class InitCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var data = new Argument<string>("data") { Description = "The data file (CSV, TSV or XLSX) to inspect." };
        var outFile = new Option<string?>("--out") { Description = "The design file to write (default: the data file's name with .yaml). Never overwritten.", HelpName = "FILE" };
        var command = new Command("init", "Propose a design file (factors, responses, blocks, run order) from a data file.\n" + ExitCodes.HelpText)
        {
            data, outFile,
        };
        command.Options.Add(new VersionOption());
        command.SetAction(parse =>
        {
            var dataPath = parse.GetValue(data)!;
            var designPath = parse.GetValue(outFile) ?? Path.ChangeExtension(dataPath, ".yaml");
            var inspected = DesignScaffold.Inspect(dataPath, designPath);
            if (!inspected.Ok)
            {
                return ProblemPrinter.Print(inspected.Problems, error);
            }

            var problem = DesignScaffold.Write(inspected.Value!, designPath);
            if (problem is not null)
            {
                return ProblemPrinter.Print([problem], error);
            }

            output.Write(DesignScaffold.Text(inspected.Value!));
            output.WriteLine("Wrote " + designPath + "; review the lines marked CHECK.");
            return ExitCodes.Clean;
        });
        return command;
    }
}
