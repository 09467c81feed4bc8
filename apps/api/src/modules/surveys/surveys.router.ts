import { Router } from 'express';
import { CreateSurveyEstimateInput, CreateSurveyInput, IdParams, PutSurveyComponentInput, PutSurveyTemplateInput, SurveyComponentParams, SurveyTemplatePianoTypeParams, UpdateSurveyInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { SurveyEstimateService } from './survey-estimate.service';
import type { SurveysService } from './surveys.service';

/**
 * Condition surveys: every member surveys (technicians usually do); the owner and foreman edit
 * templates and prepare the estimate.
 */
export function surveysRouter(service: SurveysService, prepare: SurveyEstimateService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/pianos/:id/surveys', 'member', async (req, res) => {
    res.json(await service.listForPiano(authOf(req), parse(IdParams, req.params).id));
  });

  r.post('/pianos/:id/surveys', 'member', async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.create(authOf(req), id, parse(CreateSurveyInput, req.body)));
  });

  r.get('/surveys/:id', 'member', async (req, res) => {
    res.json(await service.get(authOf(req), parse(IdParams, req.params).id));
  });

  r.patch('/surveys/:id', 'member', async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.update(authOf(req), id, parse(UpdateSurveyInput, req.body)));
  });

  r.put('/surveys/:id/components/:componentId', 'member', async (req, res) => {
    const { id, componentId } = parse(SurveyComponentParams, req.params);
    res.json(await service.putComponent(authOf(req), id, componentId, parse(PutSurveyComponentInput, req.body)));
  });

  r.get('/surveys/:id/estimate-proposal', 'member', async (req, res) => {
    res.json(await prepare.proposal(authOf(req), parse(IdParams, req.params).id));
  });

  /** The owner or foreman turns the ticked operations into a proposed job with a draft estimate. */
  r.post('/surveys/:id/estimate', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await prepare.create(authOf(req), id, parse(CreateSurveyEstimateInput, req.body)));
  });

  r.get('/survey-templates/:pianoType', 'member', async (req, res) => {
    res.json(await service.getTemplate(authOf(req), parse(SurveyTemplatePianoTypeParams, req.params).pianoType));
  });

  r.put('/survey-templates/:pianoType', BOARD_WRITERS, async (req, res) => {
    const { pianoType } = parse(SurveyTemplatePianoTypeParams, req.params);
    res.json(await service.putTemplate(authOf(req), pianoType, parse(PutSurveyTemplateInput, req.body)));
  });

  return router;
}
