namespace LunarShadow.Astronomy.Time;

/// <summary>The named ΔT models a caller may choose from.</summary>
public static class DeltaTModelCatalog
{
    private static readonly Lazy<BestDeltaT> BestModel = new(() => new BestDeltaT());
    private static readonly EspenakMeeus2006DeltaT PolynomialModel = new();

    /// <summary>The default model, <c>best</c>.</summary>
    public static IDeltaTModel Default => BestModel.Value;

    /// <summary>The names a caller may pass.</summary>
    public static IReadOnlyList<string> Names { get; } = [BestDeltaT.ModelName, EspenakMeeus2006DeltaT.ModelName];

    /// <summary>Finds a model by its public name (case-insensitive); false for an unknown name.</summary>
    public static bool TryGet(string name, out IDeltaTModel model)
    {
        switch (name.Trim().ToLowerInvariant())
        {
            case BestDeltaT.ModelName:
                model = BestModel.Value;
                return true;
            case EspenakMeeus2006DeltaT.ModelName:
                model = PolynomialModel;
                return true;
            default:
                model = BestModel.Value;
                return false;
        }
    }
}
