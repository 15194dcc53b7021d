export { sendMail, type OutgoingMail } from "./transport";
export { existingAccountMail, invitationMail, resetPasswordMail, verificationMail } from "./messages";
