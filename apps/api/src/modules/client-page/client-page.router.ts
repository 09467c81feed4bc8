import { Router } from 'express';
import { ClientAcceptInput, ClientDeclineInput, ClientPhotoParams, ClientTokenParams, IdParams, PutClientTermsInput, SendEstimateInput, UploadSizeQuery } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { ClientPageService } from './client-page.service';

const OWNER = ['owner'] as const;

/**
 * Sending estimates and the client's private page. The page's routes are public: the token is
 * the client's only key, checked on every request (expired, withdrawn and superseded links refused).
 */
export function clientPageRouter(service: ClientPageService) {
  const router = Router();
  const r = routesOn(router);

  r.get('/client-terms', BOARD_WRITERS, async (req, res) => {
    res.json(await service.getTerms(authOf(req)));
  });

  r.put('/client-terms', OWNER, async (req, res) => {
    res.json(await service.putTerms(authOf(req), parse(PutClientTermsInput, req.body)));
  });

  r.get('/estimates/:id/pdf', BOARD_WRITERS, async (req, res) => {
    const { body, filename } = await service.pdf(authOf(req), parse(IdParams, req.params).id);
    res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
    res.type('application/pdf').send(body);
  });

  r.post('/estimates/:id/send', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.status(201).json(await service.send(authOf(req), id, parse(SendEstimateInput, req.body ?? {})));
  });

  r.get('/estimates/:id/links', BOARD_WRITERS, async (req, res) => {
    res.json(await service.links(authOf(req), parse(IdParams, req.params).id));
  });

  r.post('/client-links/:id/revoke', BOARD_WRITERS, async (req, res) => {
    res.json(await service.revoke(authOf(req), parse(IdParams, req.params).id));
  });

  r.get('/client/:token', 'public', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await service.open(parse(ClientTokenParams, req.params).token));
  });

  r.post('/client/:token/accept', 'public', async (req, res) => {
    const { token } = parse(ClientTokenParams, req.params);
    res.json(await service.accept(token, parse(ClientAcceptInput, req.body), req.ip ?? 'unknown'));
  });

  r.post('/client/:token/decline', 'public', async (req, res) => {
    const { token } = parse(ClientTokenParams, req.params);
    res.json(await service.decline(token, parse(ClientDeclineInput, req.body ?? {}), req.ip ?? 'unknown'));
  });

  r.post('/client/:token/deposit', 'public', async (req, res) => {
    res.status(201).json(await service.deposit(parse(ClientTokenParams, req.params).token));
  });

  r.get('/client/:token/photos/:photoId', 'public', async (req, res) => {
    const { token, photoId } = parse(ClientPhotoParams, req.params);
    const body = await service.photo(token, photoId, parse(UploadSizeQuery, req.query).size);
    res.setHeader('Cache-Control', 'private, no-store');
    res.type('image/jpeg').send(body);
  });

  return router;
}
