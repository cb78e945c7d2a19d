using System.Runtime.InteropServices;

using CellCheck.IO.Platform;

namespace CellCheck.IO.Tests.Platform;

[Collection(HeapLayoutCollection.Name)]
public sealed class HeapPagesTests
{
    [Fact]
    public void AfterTheAdviceALargeArrayLiesInAMappingMarkedForHugePages()
    {
        if (!OperatingSystem.IsLinux() || !File.Exists("/sys/kernel/mm/transparent_hugepage/enabled")
            || Environment.GetEnvironmentVariable("CELLCHECK_SMALL_PAGES") is not null)
        {
            return; // no transparent huge pages here, or the advice turned off: Advise does nothing
        }

        // the array first, then the advice, as the tool advises the range its large arrays go to
        var array = new double[1 << 22];
        var handle = GCHandle.Alloc(array, GCHandleType.Pinned);
        HeapPages.Advise();
        try
        {
            var address = (ulong)handle.AddrOfPinnedObject();
            Assert.Contains(" hg", FlagsOfMappingAt(address), StringComparison.Ordinal); // smaps VmFlags "hg": MADV_HUGEPAGE (proc(5))
        }
        finally
        {
            handle.Free();
        }
    }

    private static string FlagsOfMappingAt(ulong address)
    {
        var inside = false;
        foreach (var line in File.ReadLines("/proc/self/smaps"))
        {
            var dash = line.IndexOf('-', StringComparison.Ordinal);
            var space = line.IndexOf(' ', StringComparison.Ordinal);
            if (dash > 0 && space > dash && !line[..space].Contains(':', StringComparison.Ordinal))
            {
                var low = Convert.ToUInt64(line[..dash], 16);
                var high = Convert.ToUInt64(line[(dash + 1)..space], 16);
                inside = address >= low && address < high;
            }
            else if (inside && line.StartsWith("VmFlags:", StringComparison.Ordinal))
            {
                return line;
            }
        }

        return "";
    }
}
