using System.Reflection;
using System.Text;
using Microsoft.AspNetCore.Http.Metadata;

namespace FilterQA.Web.Api.Intake;

/// <summary>
/// A JSON answer written from text serialised once: the first answer and every idempotent replay send the
/// same bytes. Declares <typeparamref name="T"/> with status 201 in the OpenAPI document.
/// </summary>
public sealed class StoredJsonResult<T> : IResult, IEndpointMetadataProvider, IStatusCodeHttpResult, IContentTypeHttpResult
{
    public StoredJsonResult(int statusCode, string json)
    {
        StatusCode = statusCode;
        Json = json;
    }

    public int? StatusCode { get; }

    public string Json { get; }

    public string ContentType => "application/json; charset=utf-8";

    public async Task ExecuteAsync(HttpContext httpContext)
    {
        ArgumentNullException.ThrowIfNull(httpContext);
        httpContext.Response.StatusCode = StatusCode ?? StatusCodes.Status200OK;
        httpContext.Response.ContentType = ContentType;
        await httpContext.Response.WriteAsync(Json, Encoding.UTF8).ConfigureAwait(false);
    }

    public static void PopulateMetadata(MethodInfo method, EndpointBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.Metadata.Add(new ProducesResponseTypeMetadata(StatusCodes.Status201Created, typeof(T), ["application/json"]));
    }
}
