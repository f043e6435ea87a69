using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

/// <summary>Enums are stored by name, so the database reads without the code and survives reordering.</summary>
internal static class EnumText
{
    internal const int Length = 40;

    internal static PropertyBuilder<T> AsText<T>(this PropertyBuilder<T> property) =>
        property.HasConversion<string>().HasMaxLength(Length);

    internal static ComplexTypePropertyBuilder<T> AsText<T>(this ComplexTypePropertyBuilder<T> property) =>
        property.HasConversion<string>().HasMaxLength(Length);
}
