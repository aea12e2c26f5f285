import { z } from 'zod';
import { downloadPackage } from '@/lib/server/packages/download-package';
import { apiRoute } from '@/lib/server/route';

/** GET /api/packages/:revisionId — the zip of an approved revision (409 for any other). */
export const GET = apiRoute(
  { permission: 'packages.download', params: z.object({ revisionId: z.uuid() }) },
  async (ctx, { params }) => {
    const built = await downloadPackage(ctx, params.revisionId);
    return new Response(Buffer.from(built.bytes), {
      headers: {
        'Content-Type': 'application/zip',
        'Content-Disposition': `attachment; filename="${built.fileName}"`,
        'Cache-Control': 'no-store',
        'X-Manifest-Sha256': built.manifestSha256,
      },
    });
  },
);
