namespace LunarShadow.Astronomy.Sites;

/// <summary>
/// The phases a site can see, nested as the canons time them: penumbral from P1 to P4 (the whole eclipse), partial
/// from U1 to U4, total from U2 to U3.
/// </summary>
public enum EclipsePhase
{
    /// <summary>P1 to P4.</summary>
    Penumbral,

    /// <summary>U1 to U4.</summary>
    Partial,

    /// <summary>U2 to U3.</summary>
    Total,
}
