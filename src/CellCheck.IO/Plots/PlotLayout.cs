using CellCheck.Core.Plots;
using SkiaSharp;
using M = CellCheck.IO.Plots.PlotMetrics;

namespace CellCheck.IO.Plots;

/// <summary>
/// Places everything of a <see cref="PlotModel"/> in points: the title block, column header bands and row strips of a
/// factorial grid, each panel's header strip and plotting area, tick labels and axis titles (once on the outer edges
/// for shared axes, per panel otherwise), the legend and the notes. Text is measured with the embedded fonts, so the
/// size of a picture depends only on its model.
/// </summary>
internal sealed class PlotLayout
{
    private const float SymbolSpace = 15f;

    public PlotLayout(PlotModel model, PlotFontSet fonts)
    {
        ArgumentNullException.ThrowIfNull(model);
        Model = model;
        Fonts = fonts;
        var grid = model.Grid;
        Shared = grid.SharedX is not null && grid.SharedY is not null;
        var plotW = Shared ? M.CellPlotWidth : M.PooledPlotWidth;
        var plotH = Shared ? M.CellPlotHeight : M.PooledPlotHeight;
        var axisLine = PlotFontSet.Line(fonts.AxisTitle);
        var tickLine = PlotFontSet.Line(fonts.Tick);

        var lines = model.Panels.Select(p => HeaderLines(p, plotW)).ToList();
        // each grid row's header strip is as tall as its fullest panel's lines
        var headerHeights = new float[grid.Rows];
        for (var k = 0; k < lines.Count; k++)
        {
            var r = k / grid.Columns;
            headerHeights[r] = Math.Max(headerHeights[r], lines[k].Sum(h => PlotFontSet.Line(h.Font)) + 5f);
        }

        float yGutter = 0, xGutter = 0;
        if (!Shared)
        {
            var widest = model.Panels.SelectMany(p => p.Y.Ticks).Select(t => fonts.Tick.MeasureText(t.Label)).DefaultIfEmpty(0).Max();
            yGutter = widest + M.TickLength + 4 + axisLine + 4;
            xGutter = M.TickLength + 2 + tickLine + 3 + axisLine + 2;
        }

        var gapX = Shared ? M.SharedGapX : M.OwnGapX;
        var gapY = Shared ? M.SharedGapY : M.OwnGapY;
        var slotW = yGutter + plotW;
        var rowTops = new float[grid.Rows + 1];
        var gridW = (grid.Columns * slotW) + ((grid.Columns - 1) * gapX);

        RowStripWidth = grid.RowLabels.Count == 0 ? 0 : Max(
            grid.RowLabels.Select(l => fonts.Strip.MeasureText(l)).DefaultIfEmpty(0).Max(),
            fonts.StripName.MeasureText(grid.RowTitle ?? string.Empty), 24f) + 12f;
        var yTickWidth = Shared ? grid.SharedY!.Ticks.Select(t => fonts.Tick.MeasureText(t.Label)).DefaultIfEmpty(0).Max() : 0;
        var leftArea = Shared ? axisLine + 6 + (RowStripWidth > 0 ? RowStripWidth + 6 : 0) + yTickWidth + M.TickLength + 3 : 0;
        var bottomArea = Shared ? M.TickLength + 2 + tickLine + 4 + axisLine : 0;
        var blockW = leftArea + gridW;
        ContentWidth = Math.Max(blockW, M.MinContentWidth);
        Width = (2 * M.Margin) + ContentWidth;
        var blockX = M.Margin + ((ContentWidth - blockW) / 2);

        // title block
        var y = M.Margin;
        foreach (var line in TextWrap.Lines(model.Title, fonts.Title, ContentWidth))
        {
            y += fonts.Title.Size;
            Texts.Add(new PlacedText(line, M.Margin, y, fonts.Title, PlotPalette.Ink, SKTextAlign.Left));
            y += fonts.Title.Size * (M.Leading - 1);
        }

        y += 3;
        foreach (var line in model.Subtitle.SelectMany(s => TextWrap.Lines(s, fonts.Subtitle, ContentWidth)))
        {
            y += fonts.Subtitle.Size;
            Texts.Add(new PlacedText(line, M.Margin, y, fonts.Subtitle, PlotPalette.Secondary, SKTextAlign.Left));
            y += fonts.Subtitle.Size * (M.Leading - 1);
        }

        y += 12;
        var gridX = blockX + leftArea;
        float SlotLeft(int c) => gridX + (c * (slotW + gapX));

        // column header bands
        foreach (var band in grid.ColumnHeaders)
        {
            var column = 0;
            foreach (var span in band.Spans)
            {
                var left = SlotLeft(column) + yGutter + 1;
                var right = SlotLeft(column + span.Columns - 1) + slotW - 1;
                var rect = new SKRect(left, y, right, y + M.BandHeight - 2);
                Strips.Add(rect);
                var full = band.Title + " = " + span.Label;
                var text = fonts.Strip.MeasureText(full) <= rect.Width - 8 ? full : TextWrap.Fit(span.Label, fonts.Strip, rect.Width - 8);
                Texts.Add(new PlacedText(text, rect.MidX, rect.MidY + (fonts.Strip.Size * 0.36f), fonts.Strip, PlotPalette.Ink, SKTextAlign.Center));
                column += span.Columns;
            }

            y += M.BandHeight;
        }

        if (grid.ColumnHeaders.Count > 0)
        {
            y += 4;
        }

        GridTop = y;
        for (var r = 0; r < grid.Rows; r++)
        {
            rowTops[r + 1] = rowTops[r] + headerHeights[r] + plotH + xGutter + gapY;
        }

        var stripX = blockX + axisLine + 6;
        for (var r = 0; r < grid.Rows; r++)
        {
            var rowTop = GridTop + rowTops[r];
            if (r < grid.RowLabels.Count && RowStripWidth > 0)
            {
                var rect = new SKRect(stripX, rowTop + headerHeights[r], stripX + RowStripWidth, rowTop + headerHeights[r] + plotH);
                Strips.Add(rect);
                var nameLine = PlotFontSet.Line(fonts.StripName);
                Texts.Add(new PlacedText(grid.RowTitle ?? string.Empty, rect.MidX, rect.MidY - 2, fonts.StripName, PlotPalette.Secondary, SKTextAlign.Center));
                Texts.Add(new PlacedText(grid.RowLabels[r], rect.MidX, rect.MidY - 2 + nameLine + 1, fonts.Strip, PlotPalette.Ink, SKTextAlign.Center));
            }
        }

        for (var k = 0; k < model.Panels.Count; k++)
        {
            var r = k / grid.Columns;
            var c = k % grid.Columns;
            var rowTop = GridTop + rowTops[r];
            var plotLeft = SlotLeft(c) + yGutter;
            var header = new SKRect(plotLeft, rowTop, plotLeft + plotW, rowTop + headerHeights[r]);
            var plot = new SKRect(plotLeft, rowTop + headerHeights[r], plotLeft + plotW, rowTop + headerHeights[r] + plotH);
            var bottomMost = k + grid.Columns >= model.Panels.Count;
            Slots.Add(new SlotGeometry(model.Panels[k], r, c, header, plot, lines[k])
            {
                XTickLabels = !Shared || bottomMost,
                YTickLabels = !Shared || c == 0,
                AxisTitles = !Shared,
            });
        }

        var gridBottom = GridTop + rowTops[grid.Rows] - gapY;
        if (Shared)
        {
            var plotsTop = GridTop + headerHeights[0];
            var plotsBottom = gridBottom - xGutter;
            Texts.Add(new PlacedText(grid.SharedY!.Label, blockX + (axisLine * 0.75f), (plotsTop + plotsBottom) / 2, fonts.AxisTitle, PlotPalette.Ink, SKTextAlign.Center, Vertical: true));
            Texts.Add(new PlacedText(grid.SharedX!.Label, gridX + (gridW / 2), gridBottom + M.TickLength + 2 + tickLine + 4 + fonts.AxisTitle.Size,
                fonts.AxisTitle, PlotPalette.Ink, SKTextAlign.Center));
        }

        y = gridBottom + bottomArea + 14;

        // legend: symbol, text, flowing over lines
        var legendLine = fonts.Legend.Size * 1.7f;
        var x = M.Margin;
        if (model.Legend.Count > 0)
        {
            var mid = y + (legendLine / 2);
            foreach (var item in model.Legend)
            {
                var w = 18 + 8 + fonts.Legend.MeasureText(item.Text) + 18;
                if (x > M.Margin && x + w > M.Margin + ContentWidth)
                {
                    x = M.Margin;
                    mid += legendLine;
                }

                Legend.Add(new LegendPlacement(item, x, mid));
                x += w;
            }

            y = mid + (legendLine / 2) + 4;
        }

        foreach (var line in model.Notes.SelectMany(n => TextWrap.Lines(n, fonts.Note, ContentWidth)))
        {
            y += fonts.Note.Size;
            Texts.Add(new PlacedText(line, M.Margin, y, fonts.Note, PlotPalette.Secondary, SKTextAlign.Left));
            y += fonts.Note.Size * (M.Leading - 1);
        }

        Height = y + M.Margin;
    }

    public PlotModel Model { get; }

    public PlotFontSet Fonts { get; }

    /// <summary>True when the panels share their axes (tick labels on the outer edges only).</summary>
    public bool Shared { get; }

    public float Width { get; }

    public float Height { get; }

    public float ContentWidth { get; }

    public float GridTop { get; }

    public float RowStripWidth { get; }

    public List<PlacedText> Texts { get; } = [];

    public List<SKRect> Strips { get; } = [];

    public List<SlotGeometry> Slots { get; } = [];

    public List<LegendPlacement> Legend { get; } = [];

    private static float Max(float a, float b, float c) => Math.Max(a, Math.Max(b, c));

    private List<HeaderLine> HeaderLines(Panel panel, float width)
    {
        var lines = new List<HeaderLine>();
        var room = width - (panel.Mark == PanelMark.Flagged ? SymbolSpace : 0);
        if (panel.Title is { } title)
        {
            var font = Shared ? Fonts.CellTitle : Fonts.PanelTitle;
            lines.AddRange(TextWrap.Lines(title, font, room).Select(l => new HeaderLine(l, font, true)));
        }

        foreach (var text in panel.Text)
        {
            lines.AddRange(TextWrap.Lines(text, Fonts.PanelText, room).Select(l => new HeaderLine(l, Fonts.PanelText, false)));
        }

        return lines;
    }
}
