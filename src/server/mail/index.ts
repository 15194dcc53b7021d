export { sendMail, type OutgoingMail } from "./transport";
export { verificationMail, resetPasswordMail, invitationMail } from "./messages";
