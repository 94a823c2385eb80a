namespace LunarShadow.Api.Observations.Keys;

/// <summary>An observatory key as stored: never the key itself, only its hash.</summary>
/// <param name="Id">The store's id.</param>
/// <param name="Name">The observatory's display name, unique.</param>
/// <param name="CreatedUtc">When it was added.</param>
/// <param name="RevokedUtc">When it was revoked, if it was.</param>
internal sealed record ObservatoryKey(long Id, string Name, DateTimeOffset CreatedUtc, DateTimeOffset? RevokedUtc)
{
    /// <summary>Whether the key may still write.</summary>
    public bool IsActive => RevokedUtc is null;
}
