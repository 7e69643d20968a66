import { Router } from 'express';
import { CreatePieceSchema, UpdatePieceSchema, type CreatePiece, type UpdatePiece } from '../../shared/schemas/repertoire';
import { currentUser } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { addPiece, deletePiece, listPieces, updatePiece } from '../services/piece.service';
import type { AppDeps } from './deps';
import { paramsOf } from './params';

/** Repertoire of one musician (/api/musicians/:id/pieces); clearance is derived on every read. */
export function pieceRoutes({ db, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  const ids = (req: Parameters<typeof paramsOf>[0], locals: Express.Locals) => ({ clinicianId: currentUser(locals).id, musicianId: paramsOf(req, 'id').id });

  // PieceRecord[] by title
  router.get('/', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(listPieces(db, clinicianId, musicianId, now()));
  });

  // CreatePiece -> 201 PieceRecord
  router.post('/', validateBody(CreatePieceSchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.status(201).json(addPiece(db, clinicianId, musicianId, req.body as CreatePiece, now()));
  });

  // UpdatePiece -> PieceRecord
  router.patch('/:pieceId', validateBody(UpdatePieceSchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(updatePiece(db, clinicianId, musicianId, paramsOf(req, 'pieceId').pieceId, req.body as UpdatePiece, now()));
  });

  router.delete('/:pieceId', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    deletePiece(db, clinicianId, musicianId, paramsOf(req, 'pieceId').pieceId);
    res.status(204).end();
  });

  return router;
}
