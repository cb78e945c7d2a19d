using CellCheck.Core.Plots;
using SkiaSharp;
using M = CellCheck.IO.Plots.PlotMetrics;
using P = CellCheck.IO.Plots.PlotPalette;

namespace CellCheck.IO.Plots;

/// <summary>
/// Draws a laid-out <see cref="PlotModel"/> on a canvas whose unit is the point. It maps axis units to the plotting
/// areas and strokes what the model says; it computes no statistics. With <c>textAsPaths</c> every glyph is drawn as
/// an outline (for SVG, so the embedded font is used whatever fonts the viewer has).
/// </summary>
internal sealed class PlotPainter(PlotLayout layout, bool textAsPaths)
{
    private readonly PlotFontSet _fonts = layout.Fonts;

    public void Paint(SKCanvas canvas)
    {
        canvas.Clear(P.Background);
        using (var fill = Fill(P.Strip))
        {
            foreach (var strip in layout.Strips)
            {
                canvas.DrawRoundRect(strip, 2, 2, fill);
            }
        }

        foreach (var slot in layout.Slots)
        {
            PaintSlot(canvas, slot);
        }

        foreach (var text in layout.Texts)
        {
            Text(canvas, text);
        }

        foreach (var item in layout.Legend)
        {
            LegendEntry(canvas, item);
        }
    }

    private void PaintSlot(SKCanvas canvas, SlotGeometry slot)
    {
        var panel = slot.Panel;
        var plot = slot.Plot;
        var x = layout.Model.Grid.SharedX ?? panel.X;
        var y = layout.Model.Grid.SharedY ?? panel.Y;
        var empty = panel.Mark == PanelMark.Empty;

        HeaderText(canvas, slot);
        if (panel.Mark == PanelMark.NotTestable)
        {
            Hatch(canvas, plot);
        }

        var hasAxes = x.Ticks.Count > 0 || y.Ticks.Count > 0;
        if (!empty && hasAxes)
        {
            GridLines(canvas, plot, x, y);
        }

        canvas.Save();
        canvas.ClipRect(plot);
        foreach (var series in panel.Series)
        {
            DrawSeries(canvas, plot, x, y, series);
        }

        canvas.Restore();
        foreach (var series in panel.Series.OfType<PointSeries>())
        {
            PointLabels(canvas, plot, x, y, series);
        }

        Frame(canvas, plot, panel.Mark);
        if (hasAxes)
        {
            TicksAndTitles(canvas, slot, x, y);
        }

        if (panel.Message is { } message)
        {
            var lines = TextWrap.Lines(message, _fonts.Message, plot.Width - 20);
            var line = PlotFontSet.Line(_fonts.Message);
            var top = plot.MidY - (lines.Count * line / 2) + _fonts.Message.Size;
            for (var i = 0; i < lines.Count; i++)
            {
                Text(canvas, new PlacedText(lines[i], plot.MidX, top + (i * line), _fonts.Message, empty ? P.Faint : P.Secondary, SKTextAlign.Center));
            }
        }

        if (panel.Mark == PanelMark.Flagged)
        {
            WarningSymbol(canvas, slot.Header.Right - 6.5f, slot.Header.Bottom - 14.5f);
        }
    }

    private void HeaderText(SKCanvas canvas, SlotGeometry slot)
    {
        // set against the bottom of the strip, next to the panel the lines describe
        var y = slot.Header.Bottom - 3 - slot.Lines.Sum(l => PlotFontSet.Line(l.Font)) + (slot.Lines.Count > 0 ? slot.Lines[^1].Font.Size * (M.Leading - 1) : 0);
        foreach (var line in slot.Lines)
        {
            y += line.Font.Size;
            var color = line.Strong || slot.Panel.Mark == PanelMark.None ? P.Ink : slot.Panel.Mark == PanelMark.Flagged ? P.Ink : P.Secondary;
            Text(canvas, new PlacedText(line.Text, slot.Header.Left, y, line.Font, color, SKTextAlign.Left));
            y += line.Font.Size * (M.Leading - 1);
        }
    }

    private static void GridLines(SKCanvas canvas, SKRect plot, Axis x, Axis y)
    {
        using var paint = Stroke(P.Grid, 0.6f);
        foreach (var t in x.Ticks)
        {
            var px = MapX(plot, x, t.Value);
            canvas.DrawLine(px, plot.Top, px, plot.Bottom, paint);
        }

        foreach (var t in y.Ticks)
        {
            var py = MapY(plot, y, t.Value);
            canvas.DrawLine(plot.Left, py, plot.Right, py, paint);
        }
    }

    private void DrawSeries(SKCanvas canvas, SKRect plot, Axis x, Axis y, Series series)
    {
        switch (series)
        {
            case BandSeries band:
                Band(canvas, plot, x, y, band);
                break;
            case StraightLine line:
                {
                    using var paint = LinePaint(line.Role);
                    canvas.DrawLine(MapX(plot, x, x.Min), MapY(plot, y, line.Intercept + (line.Slope * x.Min)),
                        MapX(plot, x, x.Max), MapY(plot, y, line.Intercept + (line.Slope * x.Max)), paint);
                    break;
                }

            case LineSeries path when path.X.Count > 1:
                {
                    using var paint = LinePaint(path.Role);
                    using var p = Poly(Enumerable.Range(0, path.X.Count).Select(i => new SKPoint(MapX(plot, x, path.X[i]), MapY(plot, y, path.Y[i]))), close: false);
                    canvas.DrawPath(p, paint);
                    break;
                }

            case RuleSeries rules:
                Rules(canvas, plot, x, rules);
                break;
            case PointSeries points:
                Points(canvas, plot, x, y, points);
                break;
        }
    }

    private static void Band(SKCanvas canvas, SKRect plot, Axis x, Axis y, BandSeries band)
    {
        if (band.X.Count < 2)
        {
            return;
        }

        var top = Enumerable.Range(0, band.X.Count).Select(i => new SKPoint(MapX(plot, x, band.X[i]), MapY(plot, y, band.Upper[i]))).ToArray();
        var bottom = Enumerable.Range(0, band.X.Count).Select(i => new SKPoint(MapX(plot, x, band.X[i]), MapY(plot, y, band.Lower[i]))).ToArray();
        using var path = Poly(top.Concat(bottom.Reverse()), close: true);
        using var upper = Poly(top, close: false);
        using var lower = Poly(bottom, close: false);
        using var fill = Fill(P.Envelope);
        canvas.DrawPath(path, fill);
        using var edge = Stroke(P.EnvelopeEdge, 0.6f);
        canvas.DrawPath(upper, edge);
        canvas.DrawPath(lower, edge);
    }

    private void Rules(SKCanvas canvas, SKRect plot, Axis x, RuleSeries rules)
    {
        using var paint = LinePaint(rules.Role);
        var starts = new List<float> { plot.Left };
        foreach (var at in rules.X)
        {
            var px = MapX(plot, x, at);
            canvas.DrawLine(px, plot.Top, px, plot.Bottom, paint);
            starts.Add(px);
        }

        starts.Add(plot.Right);
        for (var i = 0; i < rules.Labels.Count && i + 1 < starts.Count; i++)
        {
            var room = starts[i + 1] - starts[i] - 5;
            if (room > 12)
            {
                Text(canvas, new PlacedText(TextWrap.Fit(rules.Labels[i], _fonts.Tick, room), starts[i] + 3, plot.Top + _fonts.Tick.Size + 2, _fonts.Tick, P.Secondary, SKTextAlign.Left));
            }
        }
    }

    private void Points(SKCanvas canvas, SKRect plot, Axis x, Axis y, PointSeries points)
    {
        var highlight = points.Role == SeriesRole.Highlight;
        var radius = highlight ? M.HighlightRadius : PointRadius(points.X.Count);
        using var fill = Fill(highlight ? P.Alert : P.Points);
        // a white rim separates a few overlapping points; with many it would wash the cloud out, so it goes
        using var edge = Stroke(highlight ? P.Ink : P.Background, highlight ? 0.7f : points.X.Count > 100 ? 0f : 0.5f);
        for (var i = 0; i < points.X.Count; i++)
        {
            var px = MapX(plot, x, points.X[i]);
            var py = MapY(plot, y, points.Y[i]);
            if (highlight)
            {
                using var diamond = Diamond(px, py, radius);
                canvas.DrawPath(diamond, fill);
                canvas.DrawPath(diamond, edge);
            }
            else
            {
                canvas.DrawCircle(px, py, radius, fill);
                if (edge.StrokeWidth > 0)
                {
                    canvas.DrawCircle(px, py, radius, edge);
                }
            }
        }
    }

    private void PointLabels(SKCanvas canvas, SKRect plot, Axis x, Axis y, PointSeries points)
    {
        if (points.Labels is not { } labels)
        {
            return;
        }

        var placer = new LabelPlacer(plot);
        using var halo = Fill(P.Background.WithAlpha(220));
        var colour = points.Role == SeriesRole.Highlight ? P.Alert : P.Ink;
        using var leader = Stroke(colour.WithAlpha(160), 0.6f);
        // the most extreme points first (largest |y|): when the panel is crowded, the labels left out are the milder ones
        var order = Enumerable.Range(0, Math.Min(points.X.Count, labels.Count)).Where(i => labels[i] is not null)
            .OrderByDescending(i => Math.Abs(points.Y[i]));
        foreach (var i in order)
        {
            var label = labels[i]!;
            var px = MapX(plot, x, points.X[i]);
            var py = MapY(plot, y, points.Y[i]);
            var w = _fonts.PointLabel.MeasureText(label);
            var h = _fonts.PointLabel.Size;
            var r = (points.Role == SeriesRole.Highlight ? M.HighlightRadius : PointRadius(points.X.Count)) + 3;
            if (placer.Place(px, py, w, h, r) is not { } place)
            {
                continue; // crowded: left out rather than drawn over another label
            }

            var (box, withLeader) = place;
            if (withLeader)
            {
                canvas.DrawLine(px, py, box.Left < px ? box.Right : box.Left, box.MidY, leader);
            }

            canvas.DrawRect(box, halo);
            Text(canvas, new PlacedText(label, box.Left + 1, box.Top + h, _fonts.PointLabel, colour, SKTextAlign.Left));
        }
    }

    /// <summary>Point radius by how many points share a panel.</summary>
    private float PointRadius(int count) => layout.Shared ? M.CellPointRadius : count > 200 ? 1.6f : count > 100 ? 1.85f : M.PooledPointRadius;

    private static void Frame(SKCanvas canvas, SKRect plot, PanelMark mark)
    {
        switch (mark)
        {
            case PanelMark.Flagged:
                {
                    using var paint = Stroke(P.Alert, 2.2f);
                    canvas.DrawRect(plot, paint);
                    break;
                }

            case PanelMark.NotTestable:
            case PanelMark.Empty:
                {
                    using var paint = Stroke(P.Faint, 0.9f);
                    using var dash = SKPathEffect.CreateDash([3f, 2.5f], 0);
                    paint.PathEffect = dash;
                    canvas.DrawRect(plot, paint);
                    break;
                }

            default:
                {
                    using var paint = Stroke(P.Frame, 0.7f);
                    canvas.DrawRect(plot, paint);
                    break;
                }
        }
    }

    private static void Hatch(SKCanvas canvas, SKRect rect)
    {
        canvas.Save();
        canvas.ClipRect(rect);
        using var paint = Stroke(P.Hatch, 0.8f);
        for (var d = -rect.Height; d < rect.Width; d += 7)
        {
            canvas.DrawLine(rect.Left + d, rect.Bottom, rect.Left + d + rect.Height, rect.Top, paint);
        }

        canvas.Restore();
    }

    private void TicksAndTitles(SKCanvas canvas, SlotGeometry slot, Axis x, Axis y)
    {
        var plot = slot.Plot;
        using var tick = Stroke(P.Frame, 0.7f);
        if (slot.XTickLabels)
        {
            var baseline = plot.Bottom + M.TickLength + 2 + _fonts.Tick.Size;
            var lastRight = float.NegativeInfinity;
            foreach (var t in x.Ticks)
            {
                var px = MapX(plot, x, t.Value);
                canvas.DrawLine(px, plot.Bottom, px, plot.Bottom + M.TickLength, tick);
                var w = _fonts.Tick.MeasureText(t.Label);
                if (px - (w / 2) > lastRight + 3)
                {
                    Text(canvas, new PlacedText(t.Label, px, baseline, _fonts.Tick, P.Secondary, SKTextAlign.Center));
                    lastRight = px + (w / 2);
                }
            }

            if (slot.AxisTitles)
            {
                Text(canvas, new PlacedText(x.Label, plot.MidX, baseline + 3 + _fonts.AxisTitle.Size + 1, _fonts.AxisTitle, P.Ink, SKTextAlign.Center));
            }
        }

        if (slot.YTickLabels)
        {
            var widest = 0f;
            foreach (var t in y.Ticks)
            {
                var py = MapY(plot, y, t.Value);
                canvas.DrawLine(plot.Left - M.TickLength, py, plot.Left, py, tick);
                Text(canvas, new PlacedText(t.Label, plot.Left - M.TickLength - 2, py + (_fonts.Tick.Size * 0.36f), _fonts.Tick, P.Secondary, SKTextAlign.Right));
                widest = Math.Max(widest, _fonts.Tick.MeasureText(t.Label));
            }

            if (slot.AxisTitles)
            {
                var cx = plot.Left - M.TickLength - 4 - widest - 4 - (PlotFontSet.Line(_fonts.AxisTitle) / 2) + 2;
                Text(canvas, new PlacedText(y.Label, cx, plot.MidY, _fonts.AxisTitle, P.Ink, SKTextAlign.Center, Vertical: true));
            }
        }
    }

    private void WarningSymbol(SKCanvas canvas, float cx, float top)
    {
        const float size = 11f;
        using var triangle = Poly([new SKPoint(cx, top), new SKPoint(cx + (size * 0.58f), top + size), new SKPoint(cx - (size * 0.58f), top + size)], close: true);
        using var fill = Fill(P.Alert);
        canvas.DrawPath(triangle, fill);
        Text(canvas, new PlacedText("!", cx, top + size - 1.6f, _fonts.Symbol, P.Background, SKTextAlign.Center));
    }

    private void LegendEntry(SKCanvas canvas, LegendPlacement placement)
    {
        var x = placement.X;
        var mid = placement.MidY;
        var box = new SKRect(x, mid - 6, x + 18, mid + 6);
        switch (placement.Item.Key)
        {
            case LegendKey.Points:
                {
                    using var fill = Fill(P.Points);
                    canvas.DrawCircle(box.MidX, mid, M.CellPointRadius + 0.3f, fill);
                    break;
                }

            case LegendKey.Highlight:
                {
                    using var fill = Fill(P.Alert);
                    using var edge = Stroke(P.Ink, 0.7f);
                    using var d = Diamond(box.MidX, mid, M.HighlightRadius);
                    canvas.DrawPath(d, fill);
                    canvas.DrawPath(d, edge);
                    break;
                }

            case LegendKey.Reference:
            case LegendKey.Fit:
                {
                    using var paint = LinePaint(placement.Item.Key == LegendKey.Fit ? SeriesRole.Fit : SeriesRole.Reference);
                    canvas.DrawLine(box.Left, mid, box.Right, mid, paint);
                    break;
                }

            case LegendKey.Envelope:
                {
                    using var fill = Fill(P.Envelope);
                    using var edge = Stroke(P.EnvelopeEdge, 0.6f);
                    canvas.DrawRect(box, fill);
                    canvas.DrawRect(box, edge);
                    break;
                }

            case LegendKey.Boundary:
                {
                    using var paint = LinePaint(SeriesRole.Boundary);
                    canvas.DrawLine(box.MidX, box.Top - 1, box.MidX, box.Bottom + 1, paint);
                    break;
                }

            case LegendKey.Flagged:
                {
                    using var paint = Stroke(P.Alert, 2f);
                    canvas.DrawRect(new SKRect(box.Left + 1, box.Top + 1, box.Right - 8, box.Bottom - 1), paint);
                    WarningSymbol(canvas, box.Right - 2, box.Top - 0.5f);
                    break;
                }

            case LegendKey.NotTestable:
                {
                    Hatch(canvas, box);
                    Frame(canvas, box, PanelMark.NotTestable);
                    break;
                }
        }

        Text(canvas, new PlacedText(placement.Item.Text, box.Right + 8, mid + (_fonts.Legend.Size * 0.36f), _fonts.Legend, P.Ink, SKTextAlign.Left));
    }

    private void Text(SKCanvas canvas, PlacedText text)
    {
        if (string.IsNullOrEmpty(text.Text))
        {
            return;
        }

        using var paint = Fill(text.Color);
        if (text.Vertical)
        {
            canvas.Save();
            canvas.Translate(text.X, text.Y);
            canvas.RotateDegrees(-90);
            DrawString(canvas, text.Text, 0, text.Font.Size * 0.36f, text.Align, text.Font, paint);
            canvas.Restore();
        }
        else
        {
            DrawString(canvas, text.Text, text.X, text.Y, text.Align, text.Font, paint);
        }
    }

    private void DrawString(SKCanvas canvas, string text, float x, float y, SKTextAlign align, SKFont font, SKPaint paint)
    {
        if (!textAsPaths)
        {
            canvas.DrawText(text, x, y, align, font, paint);
            return;
        }

        var width = font.MeasureText(text);
        var left = align switch { SKTextAlign.Center => x - (width / 2), SKTextAlign.Right => x - width, _ => x };
        using var path = font.GetTextPath(text, new SKPoint(left, y));
        canvas.DrawPath(path, paint);
    }

    private static SKPaint LinePaint(SeriesRole role)
    {
        var paint = role switch
        {
            SeriesRole.Reference => Stroke(P.Reference, 1.0f),
            SeriesRole.Fit => Stroke(P.Fit, 1.4f),
            SeriesRole.Path => Stroke(P.Path, 0.8f),
            SeriesRole.Boundary => Stroke(P.Secondary, 0.9f),
            _ => Stroke(P.Faint, 0.8f),
        };
        if (role == SeriesRole.Boundary)
        {
            paint.PathEffect = SKPathEffect.CreateDash([4f, 3f], 0);
        }

        return paint;
    }

    private static SKPath Diamond(float x, float y, float r) =>
        Poly([new SKPoint(x, y - r), new SKPoint(x + r, y), new SKPoint(x, y + r), new SKPoint(x - r, y)], close: true);

    private static SKPath Poly(IEnumerable<SKPoint> points, bool close)
    {
        using var builder = new SKPathBuilder();
        builder.AddPoly(points.ToArray(), close);
        return builder.Detach();
    }

    private static float MapX(SKRect plot, Axis axis, double value) =>
        (float)(plot.Left + ((value - axis.Min) / (axis.Max - axis.Min) * plot.Width));

    private static float MapY(SKRect plot, Axis axis, double value) =>
        (float)(plot.Bottom - ((value - axis.Min) / (axis.Max - axis.Min) * plot.Height));

    private static SKPaint Fill(SKColor color) => new() { Color = color, IsAntialias = true, Style = SKPaintStyle.Fill };

    private static SKPaint Stroke(SKColor color, float width) => new() { Color = color, IsAntialias = true, Style = SKPaintStyle.Stroke, StrokeWidth = width };
}
