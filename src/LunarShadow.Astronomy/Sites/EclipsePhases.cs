using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Sites;

/// <summary>Which phase of an eclipse is in progress at an instant: the one phase classification.</summary>
public static class EclipsePhases
{
    // Common practice (the canons' contact definitions): penumbral P1–P4, partial U1–U4, total U2–U3, nested.
    /// <summary>
    /// The innermost phase in progress at an instant, by the eclipse's contact times. Each phase runs from its first
    /// contact (included) to its last (excluded), so at a contact the phase that starts there counts: at U2 the Moon is
    /// just wholly inside the umbra, at U3 it is partial again, at P4 the eclipse is over. Null outside P1…P4.
    /// </summary>
    public static EclipsePhase? At(LunarEclipse eclipse, TtInstant tt)
    {
        bool Within(ContactName first, ContactName last) =>
            eclipse.Contact(first) is { } a && eclipse.Contact(last) is { } b && a.Tt <= tt && tt < b.Tt;
        return Within(ContactName.U2, ContactName.U3) ? EclipsePhase.Total
            : Within(ContactName.U1, ContactName.U4) ? EclipsePhase.Partial
            : Within(ContactName.P1, ContactName.P4) ? EclipsePhase.Penumbral
            : null;
    }
}
