namespace CellCheck.Core.Plots;

/// <summary>The two pictures of one response: the grid of per-cell residual plots and the pooled plots.</summary>
public sealed record ResponsePictures(string Response, PlotModel Cells, PlotModel Pooled);
