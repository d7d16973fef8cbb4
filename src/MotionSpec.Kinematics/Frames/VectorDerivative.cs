using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// Time derivatives of a vector as seen in an observer A, part by part by the transport theorem: for a part x in
/// basis K, d/dt_A x = x' + omega x x and d2/dt2_A x = x'' + alpha x x + 2 omega x x' + omega x (omega x x),
/// with omega and alpha of K relative to A. Only the small component expressions are differentiated.
/// </summary>
internal sealed class VectorDerivative(AngularMotion angular, TimeDerivatives derivatives)
{
    public FrameVector First(FrameVector vector, FrameSymbol observer) =>
        vector.MapParts((basis, x) => derivatives.Of(x) + Vector3Expr.Cross(angular.Velocity(basis, observer), x));

    public FrameVector Second(FrameVector vector, FrameSymbol observer) =>
        vector.MapParts((basis, x) =>
        {
            var omega = angular.Velocity(basis, observer);
            var alpha = angular.Acceleration(basis, observer);
            var rate = derivatives.Of(x);
            var two = Symbolic.Expr.Number(2);
            return derivatives.Of(rate)
                + Vector3Expr.Cross(alpha, x)
                + (two * Vector3Expr.Cross(omega, rate))
                + Vector3Expr.Cross(omega, Vector3Expr.Cross(omega, x));
        });
}
