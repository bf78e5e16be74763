// The list of every entity the ORM knows. Add a module's entities here.
import { Workspace } from '../modules/workspaces/workspace.entity.js';
import { Invitation, Membership, PasswordReset, User } from '../modules/auth/user.entity.js';
import { Ingredient } from '../modules/ingredients/ingredient.entity.js';
import { Tray, TrayLine, TrayPhoto } from '../modules/trays/tray.entity.js';
import { Client } from '../modules/clients/client.entity.js';
import { Assembly, AssemblyItem } from '../modules/assemblies/assembly.entity.js';
import { Week, WeekCell, WeekPublication, WeekTray } from '../modules/weeks/week.entity.js';
import { PantryItem } from '../modules/shopping/pantry.entity.js';
import { ShoppingCheck, ShoppingPurchase } from '../modules/shopping/shopping.entity.js';
import { BakeRule, BakeRunSetting, CoolingRecord, Oven } from '../modules/bake-runs/bake-run.entity.js';
import { Outbox } from '../modules/mail/outbox.entity.js';
import { CaughtMail, CaughtMailAttachment } from '../modules/mail/caught-mail.entity.js';

export const entities = [Workspace, User, Membership, Invitation, PasswordReset, Ingredient, Tray, TrayLine, TrayPhoto, Client, Assembly, AssemblyItem, Week, WeekTray, WeekCell, WeekPublication, PantryItem, ShoppingCheck, ShoppingPurchase, BakeRule, Oven, BakeRunSetting, CoolingRecord, Outbox, CaughtMail, CaughtMailAttachment];
