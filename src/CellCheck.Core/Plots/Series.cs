namespace CellCheck.Core.Plots;

/// <summary>Something drawn in a panel, in axis units. The role tells the renderer how it looks.</summary>
public abstract record Series(SeriesRole Role);
