using System.Text;

namespace CellCheck.IO.Tests;

/// <summary>A design file and its data in a fresh temporary folder, deleted on dispose.</summary>
internal sealed class TempDesign : IDisposable
{
    public TempDesign(string data, string design = "data: data.csv\nfactors: [a, b]\nresponses: [y]\n", string dataName = "data.csv", bool bom = false)
    {
        Folder = Path.Combine(Path.GetTempPath(), "cellcheck-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
        DesignPath = Path.Combine(Folder, "design.yaml");
        File.WriteAllText(DesignPath, design);
        DataPath = Path.Combine(Folder, dataName);
        File.WriteAllText(DataPath, data, new UTF8Encoding(bom));
    }

    public string Folder { get; }

    public string DesignPath { get; }

    public string DataPath { get; }

    public void Dispose() => Directory.Delete(Folder, recursive: true);
}
