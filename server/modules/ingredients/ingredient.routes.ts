import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import {
  importOptionsSchema,
  ingredientIdParams,
  ingredientInputSchema,
  ingredientListQuerySchema,
  ingredientUpdateSchema,
  recipeCalcSchema,
} from '@shared/schemas/ingredients.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { HttpError, ValidationError } from '../../http/errors.js';
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

export const MAX_IMPORT_BYTES = 1024 * 1024;

const CSV_TYPES = new Set(['text/csv', 'application/csv', 'text/plain', 'application/vnd.ms-excel', 'text/comma-separated-values']);

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_IMPORT_BYTES, files: 1, fields: 10 },
  fileFilter: (_req, file, cb) => {
    const looksCsv = CSV_TYPES.has(file.mimetype.toLowerCase()) && /\.(csv|txt)$/i.test(file.originalname);
    if (looksCsv) return cb(null, true);
    cb(new HttpError(415, 'unsupported_media_type', `"${file.originalname}" is not a CSV file (text/csv, .csv)`));
  },
}).single('file');

/** multer with its errors turned into problems: 413 over 1 MB, 400 for a malformed upload. */
const uploadCsv: RequestHandler = (req, res, next) => {
  upload(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'too_large', 'The file is larger than 1 MB'));
      return next(ValidationError.field('file', `The upload could not be read (${err.message})`));
    }
    next(err);
  });
};

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
      if (!req.file) throw ValidationError.field('file', 'Attach a CSV file (form field "file")');
      const result = await importIngredientsCsv(emOf(req), actorOf(req), req.file.buffer, body.existing);
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
