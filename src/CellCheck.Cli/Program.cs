using System.CommandLine;

namespace CellCheck.Cli;

internal static class Program
{
    private static int Main(string[] args)
    {
        IO.Platform.HeapPages.Advise();
        return Run(args, Console.Out, Console.Error);
    }

    /// <summary>Parses and runs a command line; usage errors give exit code 2, a bug gives 3 with a short message.</summary>
    internal static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var root = new RootCommand("cellcheck: check the assumptions of an ANOVA (normal residuals within cells, equal spread "
            + "across cells, independence in run order, enough replicates) before trusting it.\n" + ExitCodes.HelpText)
        {
            CheckCommand.Create(output, error),
            InitCommand.Create(output, error),
            CalibrateCommand.Create(output, error),
            PlanCommand.Create(output, error),
        };
        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var e in parse.Errors)
            {
                error.WriteLine("error [usage] " + e.Message);
            }

            error.WriteLine("Run 'cellcheck --help' or 'cellcheck check --help' for usage.");
            return ExitCodes.BadInput;
        }

        try
        {
            return parse.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            error.WriteLine($"cellcheck: internal error ({ex.GetType().Name}: {ex.Message}). This is a bug; please report it with the design file.");
            return ExitCodes.InternalError;
        }
    }
}
