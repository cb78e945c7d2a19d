using System.Diagnostics;

namespace CellCheck.Cli.Tests;

/// <summary>Runs Debian's headless Chromium (installed by .ci/run) on a local page.</summary>
internal static class Chromium
{
    public const string Path = "/usr/bin/chromium";

    public static (int Code, string Out, string Err) Run(string profile, params string[] args)
    {
        Assert.True(File.Exists(Path), "Chromium is required for the browser tests: apt-get install chromium (.ci/run does)");
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
}
