import fs from 'node:fs';
import path from 'node:path';
import { parseFrontmatter } from '@astrojs/markdown-remark';
import { RecipeFrontmatterSchema } from './frontmatter';
import { fileRecord, type RecipeRecord } from './record';

/** The folder of the team's file recipes. */
export const RECIPES_DIR = path.resolve('content/recipes');

/** A file recipe whose frontmatter does not validate: its file and the first issues. */
export class RecipeFileError extends Error {
  constructor(readonly file: string, readonly issues: string[]) {
    super(`${path.basename(file)}: ${issues.join('; ')}`);
    this.name = 'RecipeFileError';
  }
}

/**
 * Reads one recipe file with Astro's own frontmatter parser and the shared schema, exactly as
 * the content collection does, for tests and scripts that run outside Astro.
 */
export function readRecipeFile(file: string): RecipeRecord {
  const { frontmatter, content } = parseFrontmatter(fs.readFileSync(file, 'utf8'), { frontmatter: 'remove' });
  const parsed = RecipeFrontmatterSchema.safeParse(frontmatter);
  if (!parsed.success) {
    throw new RecipeFileError(file, parsed.error.issues.map((i) => `${i.path.join('.') || '(root)'}: ${i.message}`));
  }
  return fileRecord(path.basename(file, '.mdx'), parsed.data, content);
}

/** Every file recipe in a folder, in file-name order. */
export function readRecipeFiles(dir: string = RECIPES_DIR): RecipeRecord[] {
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith('.mdx'))
    .sort()
    .map((f) => readRecipeFile(path.join(dir, f)));
}
