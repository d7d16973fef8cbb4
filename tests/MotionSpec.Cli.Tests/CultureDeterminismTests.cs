using System.Diagnostics;
using System.Globalization;

namespace MotionSpec.Cli.Tests;

/// <summary>
/// Every command prints the same bytes whatever the culture of the machine, and the same bytes twice in a
/// row. de-DE writes 1,5 and 1.000; tr-TR upper-cases i as İ; ar-SA has its own decimal separator and a
/// marked minus sign: a number or a name formatted with the current culture anywhere shows up as a
/// difference.
/// </summary>
public sealed class CultureDeterminismTests : IDisposable
{
    // The file name and both report names start with 'i', which tr-TR upper-cases to 'İ' in a class or method name.
    private const string IdlerArm = """
        title "Idler on a swinging arm"
        param armLength = 1.25 m
        param spinRate = 90 rpm
        param swingRate = 0.4 rad/s
        param wheelRadius = armLength / 10
        coord lift : length
        frame base
        frame arm in base {
            rotate about z by swingRate * t
            origin at [0, 0, 0.5 m]
        }
        frame idler in arm {
            origin at [armLength, 0, -0.0625 m]
            rotate about x by spinRate * t + 15 deg
        }
        point rim in idler at [0, wheelRadius, lift]
        report rim in base via idler as idlerRim
        report idler in base basis arm as idlerFrame
        """;

    // Errors whose messages carry numbers: a negative exponent, a long number, a fraction.
    private const string WithErrors = """
        param a = 1^-1001
        param b = 2^(1/2000)
        param c = 2.5 furlong
        frame f0
        """;

    private static readonly string[] Cultures = ["de-DE", "tr-TR", "ar-SA"];

    private readonly TempFolder _folder = new();

    public CultureDeterminismTests()
    {
        _folder.Write("idler-arm.motion", IdlerArm);
        _folder.Write("idler-errors.motion", WithErrors);
    }

    public void Dispose() => _folder.Dispose();

    public static TheoryData<string[]> Commands() => new()
    {
        new[] { "check", "ERR", "--diagnostics", "json" },
        new[] { "check", "ERR" },
        new[] { "eval", "SPEC" },
        new[] { "eval", "SPEC", "--format", "csv" },
        new[] { "eval", "SPEC", "--format", "json", "--set", "lift=-0.05", "--set", "lift'=0,2 m/s" },
        new[] { "eval", "SPEC", "--format", "json", "--set", "lift=-0.05", "--set", "lift'=0.2 m/s", "--t", "0:0.25s:2s" },
        new[] { "eval", "SPEC", "--format", "csv", "--set", "armLength=1500 mm", "--t", "-1s:125ms:1s" },
        new[] { "eval", "SPEC", "--t", "0:0.5s:1.5s", "--set", "lift''=-1.5" },
        new[] { "verify", "SPEC" },
        new[] { "emit", "SPEC" },
        new[] { "emit", "SPEC", "--float" },
        new[] { "derive", "SPEC" },
        new[] { "derive", "SPEC", "--format", "latex" },
        new[] { "derive", "SPEC", "--format", "text" },
        new[] { "plot", "SPEC", "--report", "idlerRim", "--t", "0:0.05s:2s", "-o", "PLOT" },
    };

    /// <summary>One of each command for the slower child processes (the compile check of emit dominates).</summary>
    public static TheoryData<string[]> ChildCommands() => new()
    {
        new[] { "check", "ERR", "--diagnostics", "json" },
        new[] { "eval", "SPEC", "--format", "json", "--set", "lift=-0.05", "--set", "lift'=0.2 m/s", "--t", "0:0.25s:2s" },
        new[] { "eval", "SPEC", "--t", "0:0.5s:1.5s", "--set", "lift''=-1.5" },
        new[] { "verify", "SPEC" },
        new[] { "emit", "SPEC" },
        new[] { "derive", "SPEC" },
        new[] { "derive", "SPEC", "--format", "text" },
        new[] { "plot", "SPEC", "--report", "idlerRim", "--t", "0:0.05s:2s", "-o", "PLOT" },
    };

    /// <summary>What a run gave: exit code, both streams and the plot's bytes when one was written.</summary>
    private sealed record Outcome(int ExitCode, string Stdout, string Stderr, string Plot);

    private string[] Expand(string[] command) =>
        [.. command.Select(a => a switch
        {
            "SPEC" => Path.Combine(_folder.Path, "idler-arm.motion"),
            "ERR" => Path.Combine(_folder.Path, "idler-errors.motion"),
            "PLOT" => Path.Combine(_folder.Path, "idler.svg"),
            _ => a,
        })];

    private Outcome Collect(CliRun run)
    {
        var plot = Path.Combine(_folder.Path, "idler.svg");
        var bytes = File.Exists(plot) ? Convert.ToBase64String(File.ReadAllBytes(plot)) : string.Empty;
        File.Delete(plot);
        return new Outcome(run.ExitCode, run.Stdout, run.Stderr, bytes);
    }

    private Outcome InProcess(string[] command, string culture)
    {
        var thread = Thread.CurrentThread;
        var (before, beforeUi) = (thread.CurrentCulture, thread.CurrentUICulture);
        try
        {
            thread.CurrentCulture = thread.CurrentUICulture = CultureInfo.GetCultureInfo(culture);
            return Collect(CliRun.Of(Expand(command)));
        }
        finally
        {
            (thread.CurrentCulture, thread.CurrentUICulture) = (before, beforeUi);
        }
    }

    private Outcome ChildProcess(string[] command, string locale)
    {
        var dotnet = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        var start = new ProcessStartInfo(string.IsNullOrEmpty(dotnet) ? "dotnet" : dotnet)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        // The shipped runtime settings make the tool culture-invariant, which would hide any leak; the same
        // binaries are started here with real cultures switched on, as the source generator's host runs them.
        var settings = Path.Combine(_folder.Path, "motionspec.runtimeconfig.json");
        var shipped = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "motionspec.runtimeconfig.json"));
        var withCultures = shipped.Replace("\"System.Globalization.Invariant\": true", "\"System.Globalization.Invariant\": false", StringComparison.Ordinal);
        Assert.NotEqual(shipped, withCultures);
        File.WriteAllText(settings, withCultures);
        start.ArgumentList.Add("exec");
        start.ArgumentList.Add("--runtimeconfig");
        start.ArgumentList.Add(settings);
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "motionspec.dll"));
        foreach (var arg in Expand(command))
        {
            start.ArgumentList.Add(arg);
        }

        // .NET on Linux and macOS takes the process culture from these variables.
        start.Environment["LANG"] = locale;
        start.Environment["LC_ALL"] = locale;
        start.Environment.Remove("DOTNET_SYSTEM_GLOBALIZATION_INVARIANT");
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(120_000), "motionspec did not finish");
        return Collect(new CliRun(process.ExitCode, stdout.Result, stderr.Result));
    }

    private static void AssertSame(Outcome expected, Outcome actual, string where)
    {
        Assert.True(expected.ExitCode == actual.ExitCode, $"{where}: exit {actual.ExitCode}, invariant culture {expected.ExitCode}");
        Assert.True(expected.Stdout == actual.Stdout, $"{where}: stdout differs at {FirstDifference(expected.Stdout, actual.Stdout)}");
        Assert.True(expected.Stderr == actual.Stderr, $"{where}: stderr differs at {FirstDifference(expected.Stderr, actual.Stderr)}");
        Assert.True(expected.Plot == actual.Plot, $"{where}: the plot's bytes differ");
    }

    private static string FirstDifference(string a, string b)
    {
        var i = 0;
        while (i < a.Length && i < b.Length && a[i] == b[i])
        {
            i++;
        }

        string Around(string s) => s.Substring(Math.Max(0, i - 40), Math.Min(s.Length, i + 40) - Math.Max(0, i - 40));
        return $"{i}: '{Around(a)}' against '{Around(b)}'";
    }

    [Fact]
    public void The_cultures_really_differ_here()
    {
        // Without ICU every culture behaves as the invariant one and the tests below could not fail.
        Assert.Equal(",", CultureInfo.GetCultureInfo("de-DE").NumberFormat.NumberDecimalSeparator);
        Assert.Equal("İ", "i".ToUpper(CultureInfo.GetCultureInfo("tr-TR")));
        Assert.NotEqual("-", CultureInfo.GetCultureInfo("ar-SA").NumberFormat.NegativeSign);
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void Same_bytes_twice_and_under_every_culture_in_process(string[] command)
    {
        var invariant = InProcess(command, string.Empty);
        Assert.True(invariant.Stdout.Length > 0 || invariant.Stderr.Length > 0 || invariant.Plot.Length > 0, "the run printed nothing to compare");
        AssertSame(invariant, InProcess(command, string.Empty), "second run");
        foreach (var culture in Cultures)
        {
            AssertSame(invariant, InProcess(command, culture), culture);
        }
    }

    [Theory]
    [MemberData(nameof(ChildCommands))]
    public void Same_bytes_in_a_process_started_under_de_DE(string[] command)
    {
        AssertSame(InProcess(command, string.Empty), ChildProcess(command, "de_DE.UTF-8"), "process under de_DE.UTF-8");
    }
}
