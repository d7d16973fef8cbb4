namespace MotionSpec.Fuzz.Tests;

/// <summary>Every input the fuzzer ever crashed or hung on now gives a diagnostic or runs clean.</summary>
public class RegressionTests
{
    // One fact over the folder rather than a theory: a theory with no rows fails, and the folder may be empty
    // between a fix and the next finding.
    [Fact]
    public void Every_finding_gives_a_diagnostic_or_a_clean_run()
    {
        var failures = new List<string>();
        foreach (var name in FuzzFiles.Inputs(FuzzFiles.Regressions))
        {
            try
            {
                _ = SpecFuzzTarget.Run(File.ReadAllBytes(Path.Combine(FuzzFiles.Regressions, name)));
            }
#pragma warning disable CA1031 // every exception is the finding coming back, whatever its type
            catch (Exception e)
#pragma warning restore CA1031
            {
                failures.Add($"{name}: {e.GetType().Name}: {e.Message}");
            }
        }

        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
    }
}
