using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>
/// Places the labels of named points inside a panel so that no two overlap: beside the point (right, then left),
/// then one line above or below, then further up or down in steps of a line, where a thin leader joins label and
/// point. A label with no clear place within <see cref="MaxSteps"/> lines is left out rather than drawn over another;
/// every named row is listed in the panel's caption and the reports anyway.
/// </summary>
internal sealed class LabelPlacer(SKRect plot)
{
    /// <summary>Lines above and below the point that are tried before a label is left out.</summary>
    public const int MaxSteps = 8;

    private readonly List<SKRect> _placed = [];

    /// <summary>The box of a label of width <paramref name="w"/> and height <paramref name="h"/> for the point at
    /// (<paramref name="px"/>, <paramref name="py"/>) of radius <paramref name="r"/>, whether it needs a leader, or
    /// null when no clear place is left.</summary>
    public (SKRect Box, bool Leader)? Place(float px, float py, float w, float h, float r)
    {
        for (var step = 0; step <= MaxSteps; step++)
        {
            foreach (var sign in step == 0 ? [0] : new[] { -1, 1 })
            {
                var dy = sign * step * (h + 3); // a label box is h + 2 high: one pixel apart
                foreach (var dx in new[] { r, -r - w })
                {
                    var baseline = py + (h * 0.36f) + dy;
                    var box = new SKRect(px + dx - 1, baseline - h, px + dx + w + 1, baseline + 2);
                    var inside = box.Left >= plot.Left + 1 && box.Right <= plot.Right - 1 && box.Top >= plot.Top + 1 && box.Bottom <= plot.Bottom - 1;
                    if (inside && !_placed.Exists(p => p.IntersectsWith(box)))
                    {
                        _placed.Add(box);
                        return (box, step > 1);
                    }
                }
            }
        }

        return null;
    }
}
