import { z } from 'zod';
import { isoDateTimeSchema, roleSchema, uuidSchema } from './common.js';
import { clockSchema, displayFormatSchema, etco2DisplayUnitSchema } from './display-settings.js';

export * from './profile-fields.js';
export * from './profile-guard.js';

// ── Users ────────────────────────────────────────────────────────────────────────────────

const emailField = z.email({ error: 'Enter a valid e-mail address' }).max(254);
const nameField = z
  .string()
  .trim()
  .min(1, { error: 'Enter the person’s name' })
  .max(120, { error: 'Keep the name under 120 characters' });
const siteIdsField = z
  .array(uuidSchema, { error: 'Choose at least one site' })
  .min(1, { error: 'Choose at least one site' })
  .max(50);

/** A user as the Admin screen lists them. */
export const adminUserSchema = z.object({
  id: uuidSchema,
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  siteIds: z.array(uuidSchema),
  active: z.boolean(),
  /** True while the person has not yet set a password from their link. */
  passwordSet: z.boolean(),
  createdAt: isoDateTimeSchema,
});
export type AdminUser = z.infer<typeof adminUserSchema>;

export const inviteUserSchema = z
  .object({ email: emailField, name: nameField, role: roleSchema, siteIds: siteIdsField })
  .strict();
export type InviteUser = z.infer<typeof inviteUserSchema>;

export const updateUserSchema = z
  .object({
    name: nameField.optional(),
    role: roleSchema.optional(),
    siteIds: siteIdsField.optional(),
    active: z.boolean().optional(),
  })
  .strict()
  .refine((u) => Object.keys(u).length > 0, { error: 'Nothing to change' });
export type UpdateUser = z.infer<typeof updateUserSchema>;

/** Password rules, each with its own message so the form can say what is missing. */
export const passwordSchema = z
  .string({ error: 'Enter a password' })
  .min(10, { error: 'Use at least 10 characters' })
  .max(200, { error: 'Use at most 200 characters' })
  .refine((p) => /[A-Za-z]/.test(p), { error: 'Include at least one letter' })
  .refine((p) => /[0-9]/.test(p), { error: 'Include at least one digit' })
  .refine((p) => p.trim() === p, { error: 'Do not start or end with a space' });

export const setPasswordSchema = z
  .object({
    token: z.string().min(20, { error: 'This link is incomplete' }).max(200),
    password: passwordSchema,
  })
  .strict();
export type SetPassword = z.infer<typeof setPasswordSchema>;

// ── Sites and units ──────────────────────────────────────────────────────────────────────

export const paperSizeSchema = z.enum(['A4', 'Letter']);
const siteNameField = z
  .string()
  .trim()
  .min(1, { error: 'Enter the site name' })
  .max(120, { error: 'Keep the name under 120 characters' });
const unitNameField = z
  .string()
  .trim()
  .min(1, { error: 'Enter the unit name' })
  .max(80, { error: 'Keep the name under 80 characters' });
const mailDomainField = z
  .string()
  .trim()
  .toLowerCase()
  .regex(/^[a-z0-9]([a-z0-9-]*[a-z0-9])?(\.[a-z0-9]([a-z0-9-]*[a-z0-9])?)+$/, {
    error: 'Enter a domain such as hospital.example',
  });
/** The organisation's e-mail domains: debrief e-mail goes only there (empty: any address). */
export const mailDomainsSchema = z.array(mailDomainField).max(20);
const displayFields = {
  locale: displayFormatSchema.shape.locale,
  timeZone: displayFormatSchema.shape.timeZone,
  clock: clockSchema,
  mailDomains: mailDomainsSchema,
};

export const siteSchema = z.object({
  id: uuidSchema,
  name: z.string(),
  etco2Unit: etco2DisplayUnitSchema,
  paperSize: paperSizeSchema,
  ...displayFields,
  units: z.array(z.object({ id: uuidSchema, name: z.string() })),
  profile: z.object({ id: uuidSchema, version: z.number().int(), name: z.string() }).nullable(),
});
export type Site = z.infer<typeof siteSchema>;

export const createSiteSchema = z
  .object({
    name: siteNameField,
    etco2Unit: etco2DisplayUnitSchema,
    paperSize: paperSizeSchema,
    locale: displayFields.locale.optional(),
    timeZone: displayFields.timeZone.optional(),
    clock: clockSchema.optional(),
    mailDomains: mailDomainsSchema.optional(),
    units: z.array(unitNameField).max(50).optional(),
  })
  .strict();
export type CreateSite = z.infer<typeof createSiteSchema>;

export const updateSiteSchema = z
  .object({
    name: siteNameField.optional(),
    etco2Unit: etco2DisplayUnitSchema.optional(),
    paperSize: paperSizeSchema.optional(),
    locale: displayFields.locale.optional(),
    timeZone: displayFields.timeZone.optional(),
    clock: clockSchema.optional(),
    mailDomains: mailDomainsSchema.optional(),
  })
  .strict()
  .refine((s) => Object.keys(s).length > 0, { error: 'Nothing to change' });
export type UpdateSite = z.infer<typeof updateSiteSchema>;

export const unitNameSchema = z.object({ name: unitNameField }).strict();
export type UnitName = z.infer<typeof unitNameSchema>;

// ── Audit log ────────────────────────────────────────────────────────────────────────────

export const auditQuerySchema = z
  .object({
    userId: uuidSchema.optional(),
    action: z.string().max(60).optional(),
    entity: z.string().max(60).optional(),
    resuscitationId: uuidSchema.optional(),
    from: isoDateTimeSchema.optional(),
    to: isoDateTimeSchema.optional(),
    limit: z.coerce.number().int().min(1).max(500).default(50),
    offset: z.coerce.number().int().min(0).default(0),
  })
  .strict();
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: isoDateTimeSchema,
  userId: uuidSchema.nullable(),
  userEmail: z.string().nullable(),
  userName: z.string().nullable(),
  action: z.string(),
  entity: z.string(),
  entityId: z.string().nullable(),
  resuscitationId: uuidSchema.nullable(),
  deviceId: z.string().nullable(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

// ── Mail ─────────────────────────────────────────────────────────────────────────────────

export const mailSinkMessageSchema = z.object({
  id: z.number().int(),
  receivedAt: isoDateTimeSchema,
  from: z.string().nullable(),
  to: z.array(z.string()),
  subject: z.string().nullable(),
  sizeBytes: z.number().int(),
});
export type MailSinkMessage = z.infer<typeof mailSinkMessageSchema>;

export const mailAttachmentSchema = z.object({
  filename: z.string().nullable(),
  contentType: z.string(),
  sizeBytes: z.number().int(),
});
export type MailAttachment = z.infer<typeof mailAttachmentSchema>;

export const mailSinkMessageDetailSchema = mailSinkMessageSchema.extend({
  /** The plain-text body, decoded from the message's transfer encoding and character set. */
  text: z.string(),
  /** Attachments as listed in the message (name, type, decoded size); content stays stored. */
  attachments: z.array(mailAttachmentSchema),
});
export type MailSinkMessageDetail = z.infer<typeof mailSinkMessageDetailSchema>;

export const mailOverviewSchema = z.object({
  sink: z.object({ items: z.array(mailSinkMessageSchema), total: z.number().int() }),
  /** Counts by status of the real delivery queue; null when this server has none. */
  outbox: z.record(z.string(), z.number().int()).nullable(),
});
export type MailOverview = z.infer<typeof mailOverviewSchema>;
