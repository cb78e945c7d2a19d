using System.Diagnostics;

namespace CellCheck.Cli.Tests;

/// <summary>Runs Debian's headless Chromium (installed by .ci/run) on a local page.</summary>
internal static class Chromium
{
    public const string Path = "/usr/bin/chromium";

    private static readonly Lazy<bool> Installed = new(Install);

    public static (int Code, string Out, string Err) Run(string profile, params string[] args)
    {
        Assert.True(Installed.Value, "Chromium is required for the browser tests: apt-get install chromium (.ci/run does)");
        var info = new ProcessStartInfo(Path)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var a in new[]
        {
            "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
            "--disable-component-update", "--disable-sync", "--enable-logging=stderr", "--v=0", "--user-data-dir=" + profile,
        }.Concat(args))
        {
            info.ArgumentList.Add(a);
        }

        using var process = Process.Start(info)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(90_000))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("Chromium did not finish in 90 s");
        }

        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    /// <summary>On a fresh machine of the project's kind (Debian, root) the tests install Debian's chromium themselves,
    /// so `dotnet test` alone is enough; elsewhere they say what to install.</summary>
    private static bool Install()
    {
        if (File.Exists(Path) || !File.Exists("/usr/bin/apt-get") || Environment.UserName != "root")
        {
            return File.Exists(Path);
        }

        foreach (var arguments in new[] { "update -qq", "install -y -qq chromium" })
        {
            var info = new ProcessStartInfo("/usr/bin/apt-get", arguments) { UseShellExecute = false, RedirectStandardOutput = true, RedirectStandardError = true };
            info.Environment["DEBIAN_FRONTEND"] = "noninteractive";
            using var process = Process.Start(info)!;
            process.StandardOutput.ReadToEnd();
            process.StandardError.ReadToEnd();
            process.WaitForExit();
        }

        return File.Exists(Path);
    }
}
