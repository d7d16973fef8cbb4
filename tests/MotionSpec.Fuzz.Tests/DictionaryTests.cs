using System.Reflection;
using System.Text.RegularExpressions;
using MotionSpec.Language;

namespace MotionSpec.Fuzz.Tests;

/// <summary>The AFL dictionary keeps up with the tokenizer's table of reserved words.</summary>
public partial class DictionaryTests
{
    [Fact]
    public void Dictionary_lists_every_reserved_word_of_the_tokenizer()
    {
        // The table is internal to the front end; reading it by reflection keeps this test from needing a
        // second copy of it (or a change to the front end's visible surface).
        var table = typeof(FrontEnd).Assembly.GetType("MotionSpec.Language.Lexing.Keywords", throwOnError: true)!;
        var all = (IReadOnlyList<string>)table.GetProperty("All", BindingFlags.Public | BindingFlags.Static)!.GetValue(null)!;
        Assert.NotEmpty(all);

        var entries = File.ReadAllLines(FuzzFiles.Dictionary)
            .Select(l => EntryPattern().Match(l))
            .Where(m => m.Success)
            .Select(m => m.Groups[1].Value)
            .ToHashSet(StringComparer.Ordinal);

        var missing = all.Where(w => !entries.Contains(w)).ToList();
        Assert.True(missing.Count == 0, "missing from motion.dict: " + string.Join(", ", missing));
    }

    [Fact]
    public void Every_dictionary_line_is_a_comment_or_a_quoted_entry()
    {
        // The AFL dictionary format, name="value" (from memory of the AFL documentation).
        var bad = File.ReadAllLines(FuzzFiles.Dictionary)
            .Where(l => l.Length > 0 && !l.StartsWith('#') && !EntryPattern().IsMatch(l))
            .ToList();

        Assert.Empty(bad);
    }

    [GeneratedRegex("^[A-Za-z0-9_]+=\"((?:[^\"\\\\]|\\\\.)*)\"$")]
    private static partial Regex EntryPattern();
}
