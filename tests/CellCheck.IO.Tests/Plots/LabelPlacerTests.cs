using CellCheck.IO.Plots;
using SkiaSharp;

namespace CellCheck.IO.Tests.Plots;

/// <summary>Point labels never overlap and stay inside the panel; a crowded label is left out (common practice, no
/// source: a label drawn over another can be read as neither).</summary>
public sealed class LabelPlacerTests
{
    [Fact]
    public void Labels_of_points_stacked_at_one_place_are_moved_apart_with_leaders_and_the_rest_are_left_out()
    {
        var plot = new SKRect(0, 0, 400, 200);
        var placer = new LabelPlacer(plot);
        var placed = new List<(SKRect Box, bool Leader)>();
        var left = 0;
        for (var i = 0; i < 60; i++)
        {
            // sixty points on top of one another in the upper right, each with a label 80 wide and 10 high
            if (placer.Place(380, 30 + (i * 0.1f), 80, 10, 4) is { } place)
            {
                placed.Add(place);
            }
            else
            {
                left++;
            }
        }

        Assert.True(placed.Count >= 10, $"{placed.Count} placed");
        Assert.True(left > 0);
        Assert.Contains(placed, p => p.Leader);
        Assert.DoesNotContain(placed, p => p.Box.Left < plot.Left || p.Box.Right > plot.Right || p.Box.Top < plot.Top || p.Box.Bottom > plot.Bottom);
        for (var a = 0; a < placed.Count; a++)
        {
            for (var b = a + 1; b < placed.Count; b++)
            {
                Assert.False(placed[a].Box.IntersectsWith(placed[b].Box), $"labels {a} and {b} overlap");
            }
        }
    }

    [Fact]
    public void A_lone_label_sits_beside_its_point_without_a_leader()
    {
        var placer = new LabelPlacer(new SKRect(0, 0, 400, 200));
        var (box, leader) = placer.Place(100, 100, 50, 10, 4)!.Value;
        Assert.False(leader);
        Assert.Equal(104 - 1, box.Left, 3);
    }
}
