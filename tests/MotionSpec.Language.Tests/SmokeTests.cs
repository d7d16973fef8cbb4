namespace MotionSpec.Language.Tests;

public class SmokeTests
{
    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(2)]
    public void Sample_specs_check_clean(int index)
    {
        Compile.Clean(Specs.All[index]);
    }
}
