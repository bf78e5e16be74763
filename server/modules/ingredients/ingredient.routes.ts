import { Router } from 'express';
import {
  importOptionsSchema,
  ingredientIdParams,
  ingredientInputSchema,
  ingredientListQuerySchema,
  ingredientUpdateSchema,
  recipeCalcSchema,
} from '@shared/schemas/ingredients.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { uploadCsv, uploadedFile } from '../../http/upload-csv.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { exportIngredientsCsv, importIngredientsCsv } from './ingredient-import.service.js';
import {
  computeParsedRecipeForActor,
  copyIngredient,
  createIngredient,
  deleteIngredient,
  getIngredient,
  listIngredients,
  updateIngredient,
} from './ingredient.service.js';

export function ingredientRoutes() {
  const r = Router();

  r.get(
    '/ingredients',
    allow('coach', 'assistant'),
    validated({ query: ingredientListQuerySchema }, ({ query }, req) => listIngredients(emOf(req), actorOf(req), query)),
  );

  r.post(
    '/ingredients',
    allow('coach'),
    validated({ body: ingredientInputSchema }, async ({ body }, req, res) => {
      const dto = await createIngredient(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );

  r.post(
    '/ingredients/import',
    allow('coach'),
    uploadCsv,
    // Form fields beside the file: `existing` = refuse (the default) | update.
    validated({ body: importOptionsSchema }, async ({ body }, req, res) => {
      const result = await importIngredientsCsv(emOf(req), actorOf(req), uploadedFile(req), body.existing);
      res.status(201);
      return result;
    }),
  );

  r.get(
    '/ingredients.csv',
    allow('coach'),
    validated({}, async (_i, req, res) => {
      res.type('text/csv; charset=utf-8').attachment('ingredients.csv').send(await exportIngredientsCsv(emOf(req), actorOf(req)));
    }),
  );

  r.get(
    '/ingredients/:id',
    allow('coach', 'assistant'),
    validated({ params: ingredientIdParams }, ({ params }, req) => getIngredient(emOf(req), actorOf(req), params.id)),
  );

  r.patch(
    '/ingredients/:id',
    allow('coach'),
    validated({ params: ingredientIdParams, body: ingredientUpdateSchema }, ({ params, body }, req) =>
      updateIngredient(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.delete(
    '/ingredients/:id',
    allow('coach'),
    validated({ params: ingredientIdParams }, async ({ params }, req) => {
      await deleteIngredient(emOf(req), actorOf(req), params.id);
    }),
  );

  r.post(
    '/ingredients/:id/copy',
    allow('coach'),
    validated({ params: ingredientIdParams }, async ({ params }, req, res) => {
      const dto = await copyIngredient(emOf(req), actorOf(req), params.id);
      res.status(201);
      return dto;
    }),
  );

  r.post(
    '/calc/recipe',
    allow('coach', 'assistant'),
    validated({ body: recipeCalcSchema }, ({ body }, req) => computeParsedRecipeForActor(emOf(req), actorOf(req), body)),
  );

  return r;
}
