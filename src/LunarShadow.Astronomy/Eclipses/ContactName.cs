namespace LunarShadow.Astronomy.Eclipses;

/// <summary>The contacts of a lunar eclipse, in time order.</summary>
public enum ContactName
{
    /// <summary>First external contact with the penumbra.</summary>
    P1,

    /// <summary>First external contact with the umbra: the partial phase begins.</summary>
    U1,

    /// <summary>First internal contact with the umbra: totality begins.</summary>
    U2,

    /// <summary>Last internal contact with the umbra: totality ends.</summary>
    U3,

    /// <summary>Last external contact with the umbra: the partial phase ends.</summary>
    U4,

    /// <summary>Last external contact with the penumbra.</summary>
    P4,
}
