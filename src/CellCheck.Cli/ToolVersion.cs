using System.Reflection;

namespace CellCheck.Cli;

/// <summary>The tool's version, from the assembly's informational version without build metadata.</summary>
internal static class ToolVersion
{
    public static string Text
    {
        get
        {
            var info = typeof(ToolVersion).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0.0.0";
            var plus = info.IndexOf('+', StringComparison.Ordinal);
            return plus < 0 ? info : info[..plus];
        }
    }
}
