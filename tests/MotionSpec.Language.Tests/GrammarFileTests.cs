using System.Text.Json;
using System.Text.RegularExpressions;
using MotionSpec.Language.Lexing;

namespace MotionSpec.Language.Tests;

public class GrammarFileTests
{
    private static string GrammarFile(string name)
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "grammar", name);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        throw new FileNotFoundException("grammar file not found above the test directory", name);
    }

    public static TheoryData<string> EbnfExamples()
    {
        var text = File.ReadAllText(GrammarFile("motionspec.ebnf"));
        var data = new TheoryData<string>();
        foreach (Match m in Regex.Matches(text, @"Example:(.*?)\*/", RegexOptions.Singleline))
        {
            data.Add(m.Groups[1].Value);
        }

        return data;
    }

    [Fact]
    public void The_grammar_has_examples()
    {
        Assert.True(EbnfExamples().Count >= 10);
    }

    [Theory]
    [MemberData(nameof(EbnfExamples))]
    public void Every_example_in_the_grammar_checks_clean(string example)
    {
        Compile.Clean(example);
    }

    [Fact]
    public void TextMate_grammar_is_json_with_the_tokenizer_keywords()
    {
        using var json = JsonDocument.Parse(File.ReadAllText(GrammarFile("motionspec.tmLanguage.json")));
        var root = json.RootElement;
        Assert.Equal("source.motion", root.GetProperty("scopeName").GetString());
        var repository = root.GetProperty("repository");
        var words = new List<string>();
        foreach (var rule in new[] { "keyword", "constant", "function" })
        {
            var match = repository.GetProperty(rule).GetProperty("match").GetString()!;
            var list = Regex.Match(match, @"\(\?:([^)]*)\)").Groups[1].Value;
            words.AddRange(list.Split('|'));
        }

        Assert.Equal(Keywords.All.OrderBy(w => w, StringComparer.Ordinal), words.OrderBy(w => w, StringComparer.Ordinal));
    }

    [Fact]
    public void Reserved_words_are_the_languages_list()
    {
        // The reserved words and function names of language version 1.
        var expected = "title param coord let frame in at origin rotate about by spin point report via basis as t pi "
            + "sin cos tan asin acos atan atan2 sqrt exp ln cross dot";
        Assert.Equal(expected.Split(' '), Keywords.All);
    }
}
