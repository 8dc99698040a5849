// zod/mini (the tree-shakable form of zod used by the file schemas) carries no messages of its
// own: this sets zod's English ones, as its full build does, for the rules that name none.
import * as z from 'zod/mini';
import { en } from 'zod/locales';

z.config(en());
