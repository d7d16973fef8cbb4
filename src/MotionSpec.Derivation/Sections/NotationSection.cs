using MotionSpec.Derivation.Document;

namespace MotionSpec.Derivation.Sections;

/// <summary>How to read the derivation, said once at the top.</summary>
internal static class NotationSection
{
    public static void Add(List<Block> blocks)
    {
        blocks.Add(new Heading(1, "How to read this derivation"));
        blocks.Add(new Paragraph(
            new Words("Every quantity is in SI units (metres, seconds, radians) and every closed form follows from the spec below. A dot is a time derivative: "),
            new Formula("\\dot{q} = dq/dt"),
            new Words(" and "),
            new Formula("\\ddot{q} = d^{2}q/dt^{2}"),
            new Words(" for a generalized coordinate "),
            new Formula("q"),
            new Words(", whose value, rate and acceleration are the inputs of every formula. Params keep their names; their values are in the table of params.")));
        blocks.Add(new Paragraph(
            new Formula("\\omega_{B/A}"),
            new Words(" is the angular velocity of frame B relative to frame A, and "),
            new Formula("\\alpha_{B/A} = \\left.\\frac{d\\omega_{B/A}}{dt}\\right|_{A}"),
            new Words(" its angular acceleration. "),
            new Formula("\\left.\\frac{d\\mathbf{u}}{dt}\\right|_{A}"),
            new Words(" is the rate of change of a vector as seen in frame A; seen from two frames the rates differ by the transport theorem, "),
            new Formula("\\left.\\frac{d\\mathbf{u}}{dt}\\right|_{A} = \\left.\\frac{d\\mathbf{u}}{dt}\\right|_{B} + \\omega_{B/A} \\times \\mathbf{u}"),
            new Words(". Angular velocities add along the tree, "),
            new Formula("\\omega_{C/A} = \\omega_{B/A} + \\omega_{C/B}"),
            new Words(", and their derivatives carry a cross term, "),
            new Formula("\\alpha_{C/A} = \\alpha_{B/A} + \\alpha_{C/B} + \\omega_{B/A} \\times \\omega_{C/B}"),
            new Words(".")));
        blocks.Add(new Paragraph(
            new Formula("\\left[\\mathbf{u}\\right]_{C}"),
            new Words(" is the column of components of a vector along the unit vectors "),
            new Formula("\\hat{x}_{C}, \\hat{y}_{C}, \\hat{z}_{C}"),
            new Words(" of frame C (its basis). A frame's rotation "),
            new Formula("R_{B}"),
            new Words(" relative to its parent P holds B's unit vectors, written in P's basis, as its columns, so "),
            new Formula("\\left[\\mathbf{u}\\right]_{P} = R_{B} \\left[\\mathbf{u}\\right]_{B}"),
            new Words(". A frame known only by its spin has no rotation matrix; its angular velocity is given in its own basis.")));
        blocks.Add(new Paragraph(
            new Words("For a point P seen from an observer frame A, with moving frame B: "),
            new Formula("\\mathbf{p}"),
            new Words(" is P's position relative to A's origin, "),
            new Formula("\\mathbf{r}"),
            new Words(" its position relative to B's origin "),
            new Formula("O_{B}"),
            new Words(", and "),
            new Formula("\\mathbf{v}_{\\mathrm{rel}} = \\left.\\frac{d\\mathbf{r}}{dt}\\right|_{B}"),
            new Words(" its velocity as seen in B. Long closed forms use named intermediates "),
            new Formula("k_{1}, k_{2}, \\ldots"),
            new Words(", each defined once in the section of named intermediates and used with the same meaning everywhere (and in the text output of the same spec).")));
    }
}
