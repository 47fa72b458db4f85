import { Router, type Request } from 'express';
import type { EntityManager, MikroORM } from '@mikro-orm/sqlite';
import { requireMembership, sessionUser } from '../common/guards.js';
import { PERMISSIONS } from '../common/permissions.js';
import { inputParse } from '../common/validate.js';
import { customerFileAggregate } from './customer-file-aggregate-load.js';
import { customerFileImportStart } from './customer-file-import.js';
import { ImportRunner } from './import-runner.js';
import { customerFileAggregateSchema, customerFileImportSchema } from './customer-file.schemas.js';
import {
  customerFileCreate,
  customerFileDelete,
  customerFileList,
  customerFileLoad,
  customerFilePreview,
  customerFileRejectedCsv,
  type CustomerFileScope,
} from './customer-file.service.js';
import { customerFileView } from './customer-file-view.js';
import { uploadReceive } from './upload-middleware.js';

/** What the customer-file routes need from the app. */
export interface CustomerFileDeps {
  em: EntityManager;
  orm: MikroORM;
  uploadsDir: string;
  uploadMaxBytes: number;
}

/**
 * `/api/organizations/:orgId/workspaces/:workspaceId/customer-files`: upload, preview, import,
 * list, read, rejected rows, aggregate, delete. Mount with the parent's `:orgId` and `:workspaceId`.
 * @param deps - entity manager, ORM (background imports), upload folder and size limit
 * @returns the router and the import runner (the app waits for it on close)
 * @example
 * const { router } = customerFileRoutes({ em, orm, uploadsDir, uploadMaxBytes });
 * app.use('/api/organizations/:orgId/workspaces/:workspaceId/customer-files', router);
 */
export function customerFileRoutes(deps: CustomerFileDeps): {
  router: Router;
  imports: ImportRunner;
} {
  const { em, orm, uploadsDir } = deps;
  const router = Router({ mergeParams: true });
  const imports = new ImportRunner(orm, uploadsDir);
  const scope = (req: Request): CustomerFileScope => ({
    organizationId: req.membership!.organization.id,
    workspaceId: String(req.params.workspaceId),
  });
  const mayWrite = (req: Request) =>
    (PERMISSIONS['customerFile.write'] as readonly string[]).includes(req.membership!.role);
  const fileId = (req: Request) => String(req.params.fileId);

  router.get('/', requireMembership(em, PERMISSIONS['customerFile.read']), async (req, res) => {
    res.json({ customerFiles: await customerFileList(em, scope(req), mayWrite(req)) });
  });

  router.post(
    '/',
    requireMembership(em, PERMISSIONS['customerFile.write']),
    uploadReceive(uploadsDir, deps.uploadMaxBytes),
    async (req, res) => {
      const file = req.file!;
      const result = await customerFileCreate(em, scope(req), sessionUser(req), {
        path: file.path,
        storedName: file.filename,
        originalName: file.originalname,
        size: file.size,
      });
      res.status(201).json(result);
    },
  );

  router.get(
    '/:fileId',
    requireMembership(em, PERMISSIONS['customerFile.read']),
    async (req, res) => {
      res.json({
        customerFile: customerFileView(
          await customerFileLoad(em, scope(req), fileId(req)),
          mayWrite(req),
        ),
      });
    },
  );

  router.get(
    '/:fileId/preview',
    requireMembership(em, PERMISSIONS['customerFile.write']),
    async (req, res) => {
      res.json({ preview: await customerFilePreview(em, scope(req), fileId(req), uploadsDir) });
    },
  );

  router.post(
    '/:fileId/import',
    requireMembership(em, PERMISSIONS['customerFile.write']),
    async (req, res) => {
      const input = inputParse(customerFileImportSchema, req.body);
      const customerFile = await customerFileImportStart(
        em,
        scope(req),
        fileId(req),
        sessionUser(req),
        input,
      );
      res.status(202).json({ customerFile });
      void imports.start(customerFile.id);
    },
  );

  router.get(
    '/:fileId/rejected.csv',
    requireMembership(em, PERMISSIONS['customerFile.write']),
    async (req, res) => {
      const { name, csv } = await customerFileRejectedCsv(
        em,
        scope(req),
        fileId(req),
        sessionUser(req),
      );
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', `attachment; filename="${name.replace(/"/g, '')}"`);
      res.setHeader('Cache-Control', 'no-store');
      res.send(csv);
    },
  );

  router.get(
    '/:fileId/aggregate',
    requireMembership(em, PERMISSIONS['customerPoints.read']),
    async (req, res) => {
      const { zoom } = inputParse(customerFileAggregateSchema, req.query);
      res.setHeader('Cache-Control', 'no-store');
      res.json(await customerFileAggregate(em, scope(req), fileId(req), zoom));
    },
  );

  router.delete(
    '/:fileId',
    requireMembership(em, PERMISSIONS['customerFile.write']),
    async (req, res) => {
      await customerFileDelete(em, scope(req), fileId(req), sessionUser(req), uploadsDir);
      res.status(204).end();
    },
  );

  return { router, imports };
}
