import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { getCertificate } from "@/lib/data/certificate";
import { certificateCsv } from "@/lib/records/certificate-csv";
import { certificatePdf } from "@/lib/records/certificate-pdf";
import { batchIdSchema, certificateSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("disposal.read", "read certificates of disposal");
  const id = batchIdSchema.parse((await params).id);
  const { format } = certificateSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const certificate = await getCertificate(user, id);
  const name = `foldwright-certificate-of-disposal-${id}.${format}`;
  const headers = { "content-disposition": `attachment; filename="${name}"`, "cache-control": "private, no-store" };
  if (format === "csv") return new Response(certificateCsv(certificate), { headers: { ...headers, "content-type": "text/csv; charset=utf-8" } });
  const pdf = await certificatePdf(certificate);
  return new Response(new Uint8Array(pdf), { headers: { ...headers, "content-type": "application/pdf", "content-length": String(pdf.length) } });
});
