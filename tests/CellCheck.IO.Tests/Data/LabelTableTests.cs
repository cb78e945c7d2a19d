using CellCheck.IO.Data;

namespace CellCheck.IO.Tests.Data;

/// <summary>The label table numbers labels by first appearance and finds them again from the characters alone
/// (common practice, no source: the behaviour of an interning dictionary, which it replaces).</summary>
public sealed class LabelTableTests
{
    [Fact]
    public void Labels_get_codes_in_order_of_first_appearance_and_repeat_their_code()
    {
        var table = new LabelTable();
        string[] cells = ["h05", "h24", "h05", "L14", "h24", "h5", "H05"];
        var codes = cells.Select(c => table.Intern(c.AsSpan())).ToArray();
        Assert.Equal([0, 1, 0, 2, 1, 3, 4], codes);
        Assert.Equal(["h05", "h24", "L14", "h5", "H05"], table.Labels);
    }

    [Fact]
    public void Many_labels_with_long_shared_prefixes_keep_their_codes_as_the_table_grows()
    {
        var table = new LabelTable();
        var labels = Enumerable.Range(0, 20_000).Select(i => $"sample_batch_{i:D6}").ToArray();
        for (var i = 0; i < labels.Length; i++)
        {
            Assert.Equal(i, table.Intern(labels[i].AsSpan()));
        }

        var buffer = new char[64];
        for (var i = labels.Length - 1; i >= 0; i -= 7)
        {
            labels[i].CopyTo(buffer);
            Assert.Equal(i, table.Intern(buffer.AsSpan(0, labels[i].Length)));
        }

        Assert.Equal(labels.Length, table.Count);
    }

    [Fact]
    public void Short_labels_that_differ_only_in_length_or_unusual_characters_keep_codes_of_their_own()
    {
        // the packed key of a short label holds its length, so "a", "a\0" and "a\0\0" are three labels; labels just
        // over the short limit go the general way and still share the numbering
        var table = new LabelTable();
        string[] cells = ["a", "a\0", "a\0\0", "", "\0", "\uffff\uffff\uffff", "abc", "abcd", "ab", "a", "abcd", "\0", ""];
        var codes = cells.Select(c => table.Intern(c.AsSpan())).ToArray();
        Assert.Equal([0, 1, 2, 3, 4, 5, 6, 7, 8, 0, 7, 4, 3], codes);
    }

    [Fact]
    public void Thousands_of_short_labels_keep_their_codes_as_the_short_table_grows()
    {
        var table = new LabelTable();
        var labels = Enumerable.Range(0, 5_000).Select(i => ((char)('A' + (i % 26))).ToString() + (i / 26).ToString("D2", System.Globalization.CultureInfo.InvariantCulture)[..2]).Distinct().ToArray();
        for (var i = 0; i < labels.Length; i++)
        {
            Assert.Equal(i, table.Intern(labels[i].AsSpan()));
        }

        for (var i = labels.Length - 1; i >= 0; i -= 3)
        {
            Assert.Equal(i, table.Intern(labels[i].ToCharArray()));
        }

        Assert.Equal(labels.Length, table.Count);
    }
}
