using System.Globalization;
using System.Runtime.InteropServices;

namespace CellCheck.IO.Platform;

/// <summary>
/// Asks Linux to back the managed heap with transparent huge pages (2 MB) where the system leaves that to each program
/// (<c>/sys/kernel/mm/transparent_hugepage/enabled</c> set to <c>madvise</c>). A check on millions of rows touches
/// gigabytes of fresh memory once; with 4 KB pages every page is a fault of its own. The runtime reserves its heap as
/// one address range at start-up: the range holding a fresh array, with the anonymous mappings joined to it on both
/// sides, is advised with <c>MADV_HUGEPAGE</c>. Advice only: where it is refused or not Linux nothing changes.
/// </summary>
public static partial class HeapPages
{
    private const int MadviseHugePage = 14;

    public static void Advise()
    {
        if (!OperatingSystem.IsLinux() || Environment.GetEnvironmentVariable("CELLCHECK_SMALL_PAGES") is not null)
        {
            return;
        }

        try
        {
            var probe = new byte[1 << 20];
            var handle = GCHandle.Alloc(probe, GCHandleType.Pinned);
            var address = (ulong)handle.AddrOfPinnedObject();
            handle.Free();
            var maps = File.ReadLines("/proc/self/maps").Select(Parse).ToList();
            var at = maps.FindIndex(m => address >= m.Low && address < m.High);
            if (at < 0 || !maps[at].Anonymous)
            {
                return;
            }

            var (first, last) = (at, at);
            while (first > 0 && maps[first - 1].High == maps[first].Low && maps[first - 1].Anonymous)
            {
                first--;
            }

            while (last < maps.Count - 1 && maps[last + 1].Low == maps[last].High && maps[last + 1].Anonymous)
            {
                last++;
            }

            _ = Madvise((nint)maps[first].Low, (nuint)(maps[last].High - maps[first].Low), MadviseHugePage);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or FormatException or DllNotFoundException or EntryPointNotFoundException)
        {
            // advice only
        }
    }

    private static (ulong Low, ulong High, bool Anonymous) Parse(string line)
    {
        var fields = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var range = fields[0].Split('-');
        return (ulong.Parse(range[0], NumberStyles.HexNumber, CultureInfo.InvariantCulture),
            ulong.Parse(range[1], NumberStyles.HexNumber, CultureInfo.InvariantCulture), fields.Length < 6);
    }

    [LibraryImport("libc", EntryPoint = "madvise")]
    private static partial int Madvise(nint address, nuint length, int advice);
}
