namespace LunarShadow.Astronomy.Time;

/// <summary>A ΔT fixed by the caller, for comparison with a source that states its own ΔT.</summary>
/// <param name="Seconds">The ΔT to use, in seconds.</param>
public sealed record FixedDeltaT(double Seconds) : IDeltaTModel
{
    /// <summary>The public name of this model.</summary>
    public const string ModelName = "fixed";

    /// <inheritdoc />
    public string Name => ModelName;

    /// <inheritdoc />
    public DeltaT At(double decimalYear) => new(Seconds, 0, ModelName);
}
