namespace CellCheck.Core.Analysis;

/// <summary>The overall status of one response and findings in plain language (which assumption, where, how strongly).</summary>
public sealed record Verdict(CheckStatus Status, IReadOnlyList<string> Findings);
