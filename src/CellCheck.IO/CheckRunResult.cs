using CellCheck.Core.Analysis;
using CellCheck.IO.Design;

namespace CellCheck.IO;

/// <summary>The design that was read and the report of its checks.</summary>
public sealed record CheckRunResult(DesignFile Design, CheckReport Report);
