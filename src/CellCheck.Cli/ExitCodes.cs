namespace CellCheck.Cli;

/// <summary>Process exit codes, documented in --help and the README.</summary>
internal static class ExitCodes
{
    /// <summary>Checks ran and nothing was flagged.</summary>
    public const int Clean = 0;

    /// <summary>Checks ran and at least one assumption was flagged.</summary>
    public const int Flagged = 1;

    /// <summary>Bad input or usage: a clear message, no stack trace.</summary>
    public const int BadInput = 2;

    /// <summary>An internal error (a bug in CellCheck).</summary>
    public const int InternalError = 3;

    public const string HelpText =
        "Exit codes: 0 = checks ran, nothing flagged; 1 = checks ran, at least one assumption flagged (with --transform: "
        + "in the transformed response); "
        + "2 = bad input or usage; 3 = internal error (please report it).";
}
