namespace MotionSpec.Evaluation;

/// <summary>
/// One state of a spec in SI: the time, every param (derived ones included) by its index, and each coord's
/// value, rate and acceleration by the coord's index.
/// </summary>
internal sealed class MotionState
{
    public MotionState(int paramCount, int coordCount)
    {
        Params = new double[paramCount];
        Values = new double[coordCount];
        Rates = new double[coordCount];
        Accelerations = new double[coordCount];
    }

    public double Time { get; set; }

    public double[] Params { get; }

    public double[] Values { get; }

    public double[] Rates { get; }

    public double[] Accelerations { get; }

    public MotionState Clone()
    {
        var copy = new MotionState(Params.Length, Values.Length) { Time = Time };
        Params.CopyTo(copy.Params, 0);
        Values.CopyTo(copy.Values, 0);
        Rates.CopyTo(copy.Rates, 0);
        Accelerations.CopyTo(copy.Accelerations, 0);
        return copy;
    }
}
