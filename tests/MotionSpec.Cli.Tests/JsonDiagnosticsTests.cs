using System.Text.Json;

namespace MotionSpec.Cli.Tests;

/// <summary>
/// <c>--diagnostics json</c>: one array on stderr for the whole run, objects with the CLI.md keys in a fixed
/// order, end exclusive. Parsed back with System.Text.Json (an independent reader of RFC 8259 JSON).
/// </summary>
public sealed class JsonDiagnosticsTests : IDisposable
{
    private static readonly string[] Keys = ["file", "line", "column", "endLine", "endColumn", "severity", "code", "message"];

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void One_array_for_all_files_with_the_keys_in_contract_order()
    {
        var clean = _folder.Write("a.motion", Specs.Clean);
        var bad = _folder.Write("b.motion", Specs.UnknownFrame);
        var worse = _folder.Write("c.motion", Specs.TwoErrors);

        var run = CliRun.Of("check", "--diagnostics", "json", clean, bad, worse);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        using var json = JsonDocument.Parse(run.Stderr);
        Assert.Equal(JsonValueKind.Array, json.RootElement.ValueKind);
        var items = json.RootElement.EnumerateArray().ToList();
        Assert.Equal(3, items.Count);
        foreach (var item in items)
        {
            Assert.Equal(Keys, item.EnumerateObject().Select(p => p.Name));
            Assert.Equal("error", item.GetProperty("severity").GetString());
        }

        Assert.Equal(bad, items[0].GetProperty("file").GetString());
        Assert.Equal(worse, items[1].GetProperty("file").GetString());
        Assert.Equal(worse, items[2].GetProperty("file").GetString());
    }

    [Fact]
    public void Span_of_a_misspelt_name_ends_just_after_it()
    {
        var bad = _folder.Write("b.motion", Specs.UnknownFrame);

        var run = CliRun.Of("check", bad, "--diagnostics", "json");

        using var json = JsonDocument.Parse(run.Stderr);
        var item = Assert.Single(json.RootElement.EnumerateArray());
        Assert.Equal(4, item.GetProperty("line").GetInt32());
        Assert.Equal(16, item.GetProperty("column").GetInt32());
        Assert.Equal(4, item.GetProperty("endLine").GetInt32());
        Assert.Equal(16 + "trolly".Length, item.GetProperty("endColumn").GetInt32());
        Assert.Equal("MOT2203", item.GetProperty("code").GetString());
        Assert.Contains("'trolley'", item.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Clean_run_prints_an_empty_array_so_stderr_always_parses()
    {
        var clean = _folder.Write("a.motion", Specs.Clean);

        var run = CliRun.Of("check", "--diagnostics", "json", clean);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using var json = JsonDocument.Parse(run.Stderr);
        Assert.Equal(0, json.RootElement.GetArrayLength());
    }

    [Fact]
    public void Same_input_gives_the_same_bytes()
    {
        var worse = _folder.Write("c.motion", Specs.TwoErrors);

        var first = CliRun.Of("check", "--diagnostics", "json", worse);
        var second = CliRun.Of("check", "--diagnostics", "json", worse);

        Assert.Equal(first.Stderr, second.Stderr);
    }

    [Fact]
    public void Unreadable_file_is_a_plain_message_and_exit_2_not_json()
    {
        // Decided: a command-line failure is not a diagnostic of any spec, so no array is printed.
        var run = CliRun.Of("check", "--diagnostics", "json", "missing.motion");

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal("motionspec: cannot read 'missing.motion': no such file", Assert.Single(run.StderrLines));
    }
}
