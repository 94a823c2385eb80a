namespace LunarShadow.Astronomy.Eclipses;

/// <summary>The kind of a lunar eclipse, by the deepest shadow the Moon enters.</summary>
public enum EclipseKind
{
    /// <summary>The Moon enters the penumbra only.</summary>
    Penumbral,

    /// <summary>Part of the Moon enters the umbra.</summary>
    Partial,

    /// <summary>The whole Moon enters the umbra.</summary>
    Total,
}
