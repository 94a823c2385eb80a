using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>One of the moments that mark an eclipse: a contact, or greatest eclipse.</summary>
/// <param name="Contact">The contact, or null for greatest eclipse.</param>
/// <param name="Tt">When, TT.</param>
/// <param name="PositionAngle">For a contact, where on the Moon's limb (as <see cref="EclipseContact.PositionAngle"/>); null at greatest.</param>
public sealed record EclipseMoment(ContactName? Contact, TtInstant Tt, Angle? PositionAngle)
{
    /// <summary>The label of greatest eclipse.</summary>
    public const string GreatestLabel = "greatest";

    /// <summary>P1…P4, or "greatest".</summary>
    public string Label => Contact?.ToString() ?? GreatestLabel;

    /// <summary>Whether this is greatest eclipse.</summary>
    public bool IsGreatest => Contact is null;

    /// <summary>The contacts with greatest eclipse in its place between U2 (or the last contact before it) and U3.</summary>
    public static IReadOnlyList<EclipseMoment> InTimeOrder(IReadOnlyList<EclipseContact> contacts, TtInstant greatest) =>
        contacts.Where(c => c.Name <= ContactName.U2).Select(c => new EclipseMoment(c.Name, c.Tt, c.PositionAngle))
            .Append(new EclipseMoment(null, greatest, null))
            .Concat(contacts.Where(c => c.Name >= ContactName.U3).Select(c => new EclipseMoment(c.Name, c.Tt, c.PositionAngle)))
            .ToList();
}
