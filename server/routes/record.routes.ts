import { Router } from 'express';
import { CreateClinicalNoteSchema, UpdateMusicianProfileSchema, type CreateClinicalNote, type UpdateMusicianProfile } from '../../shared/schemas/record';
import { currentUser } from '../middleware/auth';
import { validateBody } from '../middleware/validate';
import { loadSummary, playingChart } from '../services/chart.service';
import { addNote, checkInHistory, getProfile, listNotes, updateProfile } from '../services/record.service';
import type { AppDeps } from './deps';
import { paramsOf } from './params';

/** A musician's record for their clinician (mounted under /api/musicians/:id after the role check). */
export function recordRoutes({ db, now }: AppDeps): Router {
  const router = Router({ mergeParams: true });
  const ids = (req: Parameters<typeof paramsOf>[0], locals: Express.Locals) => ({ clinicianId: currentUser(locals).id, musicianId: paramsOf(req, 'id').id });

  // MusicianProfile
  router.get('/profile', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(getProfile(db, clinicianId, musicianId));
  });

  // UpdateMusicianProfile -> MusicianProfile
  router.patch('/profile', validateBody(UpdateMusicianProfileSchema), (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(updateProfile(db, clinicianId, musicianId, req.body as UpdateMusicianProfile, now()));
  });

  // ClinicalNote[]: private to the clinician, never shown to the musician or a teacher.
  router.get('/notes', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(listNotes(db, clinicianId, musicianId));
  });

  // CreateClinicalNote -> 201 ClinicalNote
  router.post('/notes', validateBody(CreateClinicalNoteSchema), (req, res) => {
    const clinician = currentUser(res.locals);
    const { musicianId } = ids(req, res.locals);
    res.status(201).json(addNote(db, clinician, musicianId, (req.body as CreateClinicalNote).body, now()));
  });

  // CheckInRow[], newest first
  router.get('/check-ins', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(checkInHistory(db, clinicianId, musicianId));
  });

  // PlayingChart (404 no_active_plan without an active plan)
  router.get('/chart', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(playingChart(db, clinicianId, musicianId, now()));
  });

  // LoadSummary (404 no_active_plan without an active plan)
  router.get('/load', (req, res) => {
    const { clinicianId, musicianId } = ids(req, res.locals);
    res.json(loadSummary(db, clinicianId, musicianId, now()));
  });

  return router;
}
