import { computed, ref } from 'vue'
import {
  ATTACHMENT_TYPES,
  MAX_ATTACHMENT_BYTES,
  attachmentFileNameSchema,
  canEditHangs,
  canEditInventory,
  contentTypeForName,
  fileSizeInWords,
  type Attachment,
} from '../../shared/schemas/index.js'
import { attachmentsApi } from '../api/attachments'
import { ApiError } from '../api/errors'
import { useSessionStore } from '../stores/session'
import { useAsyncTask } from './useAsyncTask'

/**
 * Why a file would be refused, checked before sending so a person hears it at once; the server checks again,
 * by the file's content too. Undefined when the file may be sent.
 */
export function refusalBeforeSending(file: File): string | undefined {
  const name = attachmentFileNameSchema.safeParse(file.name)
  if (!name.success) return name.error.issues[0]!.message
  if (!contentTypeForName(file.name)) return 'Only photos (JPEG, PNG, WebP) and PDF documents can be attached'
  if (file.size > MAX_ATTACHMENT_BYTES)
    return `“${file.name}” is ${fileSizeInWords(file.size)}; the largest file is ${fileSizeInWords(MAX_ATTACHMENT_BYTES)}`
  return undefined
}

/** What kind of file it is and how big, in words: "PNG image · 240 KB". */
export const attachmentDetails = (attachment: Attachment) =>
  `${ATTACHMENT_TYPES[attachment.contentType]?.words ?? attachment.contentType} · ${fileSizeInWords(attachment.byteSize)}`

/** A lineset's attachments: the list, an upload with its progress, and deleting one. */
export function useAttachments(linesetId: () => string) {
  const session = useSessionStore()
  const attachments = ref<Attachment[]>([])
  const loading = useAsyncTask()
  const uploading = useAsyncTask()
  const removing = useAsyncTask()
  /** The share of the file sent so far, 0 to 1, while an upload runs. */
  const progress = ref(0)

  const canUpload = computed(() => canEditHangs(session.role))
  const canDelete = (attachment: Attachment) =>
    canEditInventory(session.role) || (canUpload.value && attachment.uploadedBy?.id === session.user?.id)

  async function load() {
    const found = await loading.run(() => attachmentsApi.list(linesetId()))
    if (found) attachments.value = found
  }

  async function upload(file: File): Promise<boolean> {
    const refusal = refusalBeforeSending(file)
    if (refusal) {
      uploading.error.value = new ApiError(400, 'invalid_file', refusal, { file: refusal })
      return false
    }
    progress.value = 0
    const saved = await uploading.run(() => attachmentsApi.upload(linesetId(), file, (sent) => (progress.value = sent)))
    if (!saved) return false
    attachments.value = [saved, ...attachments.value]
    return true
  }

  async function remove(attachment: Attachment): Promise<boolean> {
    await removing.run(() => attachmentsApi.remove(attachment.id))
    if (removing.error.value) return false
    attachments.value = attachments.value.filter((one) => one.id !== attachment.id)
    return true
  }

  return { attachments, loading, uploading, removing, progress, canUpload, canDelete, load, upload, remove }
}
