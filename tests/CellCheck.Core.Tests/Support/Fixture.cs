namespace CellCheck.Core.Tests.Support;

/// <summary>Locates files copied from Fixtures/ to the test output folder.</summary>
internal static class Fixture
{
    public static string Path(string relative) => System.IO.Path.Combine(AppContext.BaseDirectory, "Fixtures", relative);
}
